import { Outlet } from 'react-router-dom';
import { Logo } from '../../components/ui/logo';

const POINTS = [
  ['Panels', 'Lay out the operator’s touch targets on a grid and publish them to the driver station.'],
  ['Live', 'Taps travel over the relay to the robot, which answers every one.'],
  ['Recordings', 'Replay each match on one timeline and read the cycle times.'],
] as const;

export function Component() {
  return (
    <div className="grid min-h-dvh lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <aside className="relative hidden overflow-hidden border-r border-asphalt-800 bg-asphalt-900 p-10 lg:sticky lg:top-0 lg:flex lg:h-dvh lg:flex-col">
        <Logo />
        <div className="relative my-auto max-w-md pt-10">
          <p className="text-xs font-semibold tracking-[0.18em] text-signal-400 uppercase">For the software subteam</p>
          <p className="mt-3 text-[2.5rem] leading-[1.1] font-bold text-asphalt-100">
            From the operator’s tap to the replay in the pit.
          </p>
          <ul className="mt-8 flex flex-col gap-4">
            {POINTS.map(([title, text]) => (
              <li key={title} className="flex gap-3">
                <span aria-hidden="true" className="mt-2 size-2 shrink-0 rounded-full bg-signal-500" />
                <p className="text-[0.9375rem] text-asphalt-300">
                  <span className="font-semibold text-asphalt-100">{title}.</span> {text}
                </p>
              </li>
            ))}
          </ul>
        </div>
        <p className="text-sm text-asphalt-500">Self-hosted. Runs on the driver-station laptop.</p>
        <svg
          aria-hidden="true"
          viewBox="0 0 400 400"
          className="pointer-events-none absolute -right-36 -bottom-36 size-[24rem] text-asphalt-800"
        >
          <g fill="none" stroke="currentColor" strokeWidth="2">
            <polygon points="200,40 338,120 338,280 200,360 62,280 62,120" />
            <polygon points="200,90 295,145 295,255 200,310 105,255 105,145" />
            <polygon points="200,140 252,170 252,230 200,260 148,230 148,170" />
          </g>
        </svg>
      </aside>
      <main className="flex flex-col items-center justify-center px-5 py-10">
        <Logo className="mb-8 lg:hidden" />
        <Outlet />
      </main>
    </div>
  );
}
