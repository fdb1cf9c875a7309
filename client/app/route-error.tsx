import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { buttonClasses } from '../components/ui/button-styles';
import { Logo } from '../components/ui/logo';

/** Last line of defence: a page that broke while rendering, or a route that failed to load. */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : null;
  return (
    <main className="grid min-h-dvh place-items-center p-6">
      <div className="max-w-md text-center">
        <Logo className="mb-8" />
        <h1 className="text-2xl font-bold">This page stopped working</h1>
        <p className="mt-2 text-asphalt-300">
          Something on this page broke. Reloading usually fixes it. If Pitwall was just updated, the reload fetches
          the new version.
        </p>
        {detail && <p className="num mt-4 rounded-lg bg-asphalt-850 p-3 text-left text-sm text-asphalt-300">{detail}</p>}
        <div className="mt-6 flex justify-center gap-3">
          <button type="button" className={buttonClasses('primary')} onClick={() => window.location.reload()}>
            Reload
          </button>
          <a href="/" className={buttonClasses('secondary')}>
            Team home
          </a>
        </div>
      </div>
    </main>
  );
}
