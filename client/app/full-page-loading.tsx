import { LogoMark } from '../components/ui/logo';
import { Spinner } from '../components/ui/spinner';

export function FullPageLoading() {
  return (
    <div role="status" className="grid min-h-dvh place-items-center">
      <div className="flex flex-col items-center gap-4 text-asphalt-400">
        <LogoMark className="size-12" />
        <span className="flex items-center gap-2 text-sm font-medium">
          <Spinner className="text-signal-500" /> Opening Pitwall…
        </span>
      </div>
    </div>
  );
}
