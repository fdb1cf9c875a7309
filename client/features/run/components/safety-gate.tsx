import type { ReactNode } from 'react';
import type { Theme } from '../../../../shared/schemas/panel';

type SafetyGateProps = { theme: Theme; robotName: string; caution: ReactNode; onConfirm: () => void };

/** Before a panel goes live to a real robot: the safety caution, confirmed once per robot connection. */
export function SafetyGate({ theme, robotName, caution, onConfirm }: SafetyGateProps) {
  return (
    <div className="fixed inset-0 z-40 grid place-items-center bg-black/75 p-6 backdrop-blur-sm">
      <div role="alertdialog" aria-modal="true" aria-labelledby="run-safety-title" className="flex w-full max-w-2xl flex-col gap-5 rounded-2xl p-6" style={{ background: theme.surface, color: theme.text }}>
        <h2 id="run-safety-title" className="text-2xl font-bold">
          This panel is live to a real robot: {robotName}
        </h2>
        {caution}
        <button
          type="button"
          autoFocus
          onClick={onConfirm}
          className="min-h-14 rounded-xl px-6 text-xl font-bold"
          style={{ background: theme.accent, color: theme.accentText }}
        >
          I understand — open the panel
        </button>
      </div>
    </div>
  );
}
