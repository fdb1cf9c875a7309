import type { Theme } from '../../../../shared/schemas/panel';

export type PillTone = 'ok' | 'warn' | 'danger';

type LinkPillProps = {
  /** What the pill is about, read first by screen readers: "Relay link", "Robot link". */
  name: string;
  words: string;
  tone: PillTone;
  theme: Theme;
  detail?: string;
};

const MARKS: Record<PillTone, string> = { ok: '●', warn: '▲', danger: '✕' };

/**
 * A link state in big words with a shaped mark: calm and outlined when fine, filled solid when not, so a
 * lost link is told by shape, fill and words, not by colour alone.
 */
export function LinkPill({ name, words, tone, theme, detail }: LinkPillProps) {
  const colour = theme[tone];
  const isCalm = tone === 'ok';
  return (
    <span
      role="status"
      aria-label={name}
      title={detail}
      data-tone={tone}
      className={`inline-flex min-h-10 shrink-0 items-center gap-2 rounded-lg px-3 text-[15px] leading-none font-bold tracking-wide whitespace-nowrap uppercase ${tone === 'danger' ? 'animate-pulse' : ''}`}
      style={isCalm ? { color: colour, boxShadow: `inset 0 0 0 2px ${colour}` } : { background: colour, color: theme.canvas }}
    >
      <span aria-hidden="true">{MARKS[tone]}</span>
      <span className="max-w-[20rem] truncate">{words}</span>
    </span>
  );
}
