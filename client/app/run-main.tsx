// Run mode's own light entry (client/run.html), served for /run and /panels/:id/run: the providers and the
// run screen only, without React Router and the app's routes, so the driver-station tablet loads less.
// The full app (main.tsx) still has both routes for in-app navigation.
import '@fontsource/barlow/400.css';
import '@fontsource/barlow/500.css';
import '@fontsource/barlow/600.css';
import '@fontsource/barlow/700.css';
import '@fontsource/jetbrains-mono/400.css';
import '@fontsource/jetbrains-mono/600.css';
import './styles.css';
import { Component as ReactComponent, StrictMode, type ReactNode } from 'react';
import { createRoot } from 'react-dom/client';
import { RunMessage } from '../features/run/components/run-message';
import { Providers } from './providers';
import { Component as PublishedRun, PanelRunComponent, runPanelIdFrom } from './routes/run';

/** Last line of defence, as the app's route error page is: a run screen that broke while rendering. */
class RunErrorBoundary extends ReactComponent<{ children: ReactNode }, { error: unknown }> {
  override state = { error: undefined as unknown };
  static getDerivedStateFromError(error: unknown) {
    return { error };
  }
  override render() {
    if (this.state.error === undefined) return this.props.children;
    return (
      <RunMessage
        tone="problem"
        title="Run mode stopped working"
        action={
          <button type="button" onClick={() => window.location.reload()} className="inline-flex min-h-12 items-center rounded-lg bg-signal-500 px-5 text-lg font-bold text-asphalt-950">
            Reload
          </button>
        }
      >
        {this.state.error instanceof Error ? `${this.state.error.message}. ` : ''}Reloading usually fixes it; if Pitwall was just updated, the reload fetches the new version.
      </RunMessage>
    );
  }
}

function RunPage({ pathname }: { pathname: string }) {
  if (/^\/run\/?$/.test(pathname)) return <PublishedRun />;
  const panelId = runPanelIdFrom(pathname);
  if (panelId !== undefined) return <PanelRunComponent panelId={panelId} />;
  return (
    <RunMessage tone="problem" title="Nothing runs at this address">
      Run mode opens at /run, the team’s published panel, or at /panels/…/run for one panel.
    </RunMessage>
  );
}

const root = document.getElementById('root');
if (!root) throw new Error('run.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <Providers>
      <RunErrorBoundary>
        <RunPage pathname={window.location.pathname} />
      </RunErrorBoundary>
    </Providers>
  </StrictMode>,
);
