// Pure: the drill editor's form state, its conversion to the API body (with messages per field) and the words
// that summarise a drill in the list.
import { BRANCH_LETTERS, type BranchLetter } from '../../../../shared/domain/channels';
import { callText, sortedBranches, sortedLevels, type CoralStation, type DrillCall } from '../../../../shared/domain/drills/drill-calls';
import { planCallCount, type DrillPace, type DrillPlan } from '../../../../shared/domain/drills/drill-plan';
import type { ReefLevel } from '../../../../shared/domain/season/season-profile';
import { drillBodySchema, type Drill, type DrillBody } from '../../../../shared/schemas/drill';

export type DrillForm = {
  name: string;
  mode: 'random' | 'scripted';
  branches: BranchLetter[];
  levels: ReefLevel[];
  stations: CoralStation[];
  count: string;
  /** One call per line or comma: "C L4", "L2", "H", "left". */
  script: string;
  paceMode: DrillPace['mode'];
  intervalS: string;
  limitS: string;
};

/** The reef's six faces by their branch letters (AB, CD …), for choosing both branches of a face at once. */
export const FACES: readonly (readonly [BranchLetter, BranchLetter])[] = [0, 1, 2, 3, 4, 5].map((i) => [BRANCH_LETTERS[2 * i]!, BRANCH_LETTERS[2 * i + 1]!] as const);

export const NEW_DRILL_FORM: DrillForm = {
  name: '',
  mode: 'random',
  branches: [...BRANCH_LETTERS],
  levels: ['L2', 'L3', 'L4'],
  stations: [],
  count: '10',
  script: 'C L4\nleft\nJ L4\nright',
  paceMode: 'interval',
  intervalS: '4',
  limitS: '8',
};

const scriptLine = (c: DrillCall) => (c.station ? c.station : [c.branch, c.level].filter(Boolean).join(' '));

export function formFromDrill(drill: Drill): DrillForm {
  const plan = drill.plan;
  return {
    ...NEW_DRILL_FORM,
    name: drill.name,
    mode: plan.mode,
    ...(plan.mode === 'random'
      ? { branches: plan.targets.branches, levels: plan.targets.levels, stations: plan.targets.stations, count: String(plan.count) }
      : { script: plan.calls.map(scriptLine).join('\n') }),
    paceMode: drill.pace.mode,
    intervalS: drill.pace.mode === 'interval' ? String(drill.pace.intervalMs / 1000) : NEW_DRILL_FORM.intervalS,
    limitS: drill.pace.mode === 'on-answer' ? String(drill.pace.limitMs / 1000) : NEW_DRILL_FORM.limitS,
  };
}

/** Both branches of a face chosen → unchosen; otherwise both chosen. */
export function toggleFace(branches: readonly BranchLetter[], face: readonly [BranchLetter, BranchLetter]): BranchLetter[] {
  const hasBoth = face.every((b) => branches.includes(b));
  return sortedBranches(hasBoth ? branches.filter((b) => !face.includes(b)) : [...branches, ...face]);
}

export function toggleItem<T extends string>(items: readonly T[], item: T): T[] {
  return items.includes(item) ? items.filter((i) => i !== item) : [...items, item];
}

/** Reads one scripted call: a branch letter and/or a level (any order), or a station ("left", "right station"). */
export function parseScriptLine(line: string): DrillCall | string {
  const words = line.trim().toLowerCase().replace(/[·,]/g, ' ').split(/\s+/).filter((w) => w && w !== 'station' && w !== 'branch' && w !== 'level');
  if (words.length === 0) return 'Empty call';
  const station = words.find((w) => w === 'left' || w === 'right') as CoralStation | undefined;
  if (station) return words.length === 1 ? { station } : `“${line.trim()}”: a station call has nothing else`;
  const call: DrillCall = {};
  for (const w of words) {
    if (/^l[1-4]$/.test(w) && !call.level) call.level = w.toUpperCase() as ReefLevel;
    else if (/^[a-l]$/.test(w) && !call.branch) call.branch = w.toUpperCase() as BranchLetter;
    else return `“${line.trim()}”: “${w}” is not a branch (A–L), a level (L1–L4) or a station (left, right)`;
  }
  return call;
}

/** Every call of a script, or the first problem. */
export function parseScript(script: string): { calls: DrillCall[] } | { error: string } {
  const lines = script.split(/[\n,;]/).map((l) => l.trim()).filter(Boolean);
  if (lines.length === 0) return { error: 'Script at least one call' };
  const calls: DrillCall[] = [];
  for (const [i, line] of lines.entries()) {
    const parsed = parseScriptLine(line);
    if (typeof parsed === 'string') return { error: `Call ${i + 1}: ${parsed}` };
    calls.push(parsed);
  }
  return { calls };
}

export type FormErrors = Partial<Record<'name' | 'targets' | 'count' | 'script' | 'intervalS' | 'limitS' | 'form', string>>;

const seconds = (text: string) => (text.trim() === '' ? Number.NaN : Number(text.replace(',', '.')));

/** The body to send, or messages by field. */
export function bodyFromForm(form: DrillForm): { body: DrillBody } | { errors: FormErrors } {
  const errors: FormErrors = {};
  let plan: DrillPlan | undefined;
  if (form.mode === 'scripted') {
    const parsed = parseScript(form.script);
    if ('error' in parsed) errors.script = parsed.error;
    else plan = { mode: 'scripted', calls: parsed.calls };
  } else {
    const count = Number(form.count);
    if (!Number.isInteger(count)) errors.count = 'Give a whole number of calls';
    plan = { mode: 'random', targets: { branches: sortedBranches(form.branches), levels: sortedLevels(form.levels), stations: form.stations }, count };
  }
  const pace: DrillPace =
    form.paceMode === 'interval'
      ? { mode: 'interval', intervalMs: Math.round(seconds(form.intervalS) * 1000) }
      : { mode: 'on-answer', limitMs: Math.round(seconds(form.limitS) * 1000) };
  const parsed = drillBodySchema.safeParse({ name: form.name, plan, pace });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const path = issue.path.join('.');
      const field: keyof FormErrors = path.startsWith('name')
        ? 'name'
        : path.startsWith('plan.targets')
          ? 'targets'
          : path.startsWith('plan.count')
            ? 'count'
            : path.startsWith('plan.calls')
              ? 'script'
              : path.startsWith('pace.intervalMs')
                ? 'intervalS'
                : path.startsWith('pace.limitMs')
                  ? 'limitS'
                  : 'form';
      errors[field] ??= field === 'intervalS' || field === 'limitS' ? issue.message.replace(/^Expected.*/, 'Give a number of seconds') : issue.message;
    }
  }
  if (Object.keys(errors).length || !parsed.success) return { errors };
  return { body: parsed.data };
}

/** "12 random calls from 12 branches × L2–L4" or "8 scripted calls: Left station, L4 · C …". */
export function planSummary(plan: DrillPlan): string {
  if (plan.mode === 'scripted') {
    const shown = plan.calls.slice(0, 3).map(callText).join(', ');
    return `${plan.calls.length} scripted call${plan.calls.length === 1 ? '' : 's'}: ${shown}${plan.calls.length > 3 ? ' …' : ''}`;
  }
  const t = plan.targets;
  const parts: string[] = [];
  if (t.branches.length) parts.push(t.branches.length === 12 ? 'every branch' : `branches ${sortedBranches(t.branches).join(' ')}`);
  if (t.levels.length) parts.push(sortedLevels(t.levels).join(' '));
  if (t.stations.length) parts.push(t.stations.length === 2 ? 'both stations' : `${t.stations[0]} station`);
  return `${planCallCount(plan)} random calls · ${parts.join(' · ')}`;
}

export function paceSummary(pace: DrillPace): string {
  return pace.mode === 'interval' ? `A call every ${pace.intervalMs / 1000} s` : `Next call on answer · ${pace.limitMs / 1000} s to answer`;
}
