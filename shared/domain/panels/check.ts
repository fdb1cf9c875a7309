// Pure: imports only shared files. The panel check: what is wrong or risky in a panel document, listed for the
// designer (and marked on its canvas) as it is edited.
//
// Rules and their sources: touch targets (as run mode draws them on the device, touch-targets.ts) under
// 44 × 44 CSS px warn (WCAG 2.2 SC 2.5.5 Target Size,
// Enhanced) and under 24 × 24 are errors (SC 2.5.8 Target Size, Minimum); text below 4.5:1 against its
// background warns (SC 1.4.3 Contrast, Minimum); overlapping tiles, tiles without a channel and two tiles
// writing one channel with different value types or value sets are errors; channels the panel writes that
// the connected robot does not read (its hello's `reads`) warn.
import type { Page, PanelDocument, Theme, ThemeColour, Tile } from '../../schemas/panel';
import type { SeasonProfile } from '../season/season-profile';
import { contrastRatio, formatContrastRatio, TEXT_CONTRAST_MINIMUM } from './contrast';
import { cellRectsOverlap, deviceSize } from './grid';
import { kindNeedsChannel, THEME_COLOUR_NAMES, TILE_CATALOGUE, tileDisplayName, tileWrites, type ChannelUse } from './tile-catalogue';
import { tileTouchTargets } from './touch-targets';

export type PanelIssueRule = 'target-below-44' | 'target-below-24' | 'low-contrast' | 'overlap' | 'no-channel' | 'type-clash' | 'robot-does-not-read';

export type PanelIssue = {
  /** Stable across checks of the same problem: use it as a React key. */
  id: string;
  rule: PanelIssueRule;
  severity: 'error' | 'warning';
  pageId: string;
  tileIds: string[];
  message: string;
};

export type PanelCheckContext = {
  /** The `op/` channels the connected robot reads (from its hello); an entry ending in `/` covers a prefix. Omit when no robot is connected. */
  robotReads?: readonly string[];
  /** The season whose reef the reef picker draws (default 2025). */
  season?: SeasonProfile;
};

/** WCAG 2.2 SC 2.5.5 (enhanced) and SC 2.5.8 (minimum) target sizes, CSS px. */
export const TARGET_ENHANCED_PX = 44;
export const TARGET_MINIMUM_PX = 24;

/**
 * Text the tile renderers draw on colours other than the tile's own fill: option buttons and pads show
 * `text` on `canvas` when idle and `accentText` on `accent` when chosen (client/components/panel-tiles/).
 */
export const BUTTON_TEXT_PAIRS: readonly { ink: ThemeColour; fill: ThemeColour; state: string }[] = [
  { ink: 'text', fill: 'canvas', state: 'idle' },
  { ink: 'accentText', fill: 'accent', state: 'chosen' },
];


const SEVERITY_ORDER = { error: 0, warning: 1 } as const;

/** Every issue of a panel, errors first, then in page order, each page's in tile order. */
export function checkPanel(doc: PanelDocument, context: PanelCheckContext = {}): PanelIssue[] {
  const issues: PanelIssue[] = [];
  const pageOrder = new Map(doc.pages.map((p, i) => [p.id, i]));
  for (const page of doc.pages) {
    issues.push(...targetIssues(doc, page, context.season));
    issues.push(...contrastIssues(doc.theme, page));
    issues.push(...overlapIssues(page));
    issues.push(...channelIssues(page));
  }
  issues.push(...clashIssues(doc));
  if (context.robotReads) issues.push(...unreadIssues(doc, context.robotReads));
  return issues
    .map((issue, index) => ({ issue, index }))
    .sort(
      (a, b) =>
        SEVERITY_ORDER[a.issue.severity] - SEVERITY_ORDER[b.issue.severity] ||
        (pageOrder.get(a.issue.pageId) ?? 0) - (pageOrder.get(b.issue.pageId) ?? 0) ||
        a.index - b.index,
    )
    .map(({ issue }) => issue);
}

/** Issues that mark a given tile (for the canvas). */
export function issuesForTile(issues: readonly PanelIssue[], pageId: string, tileId: string): PanelIssue[] {
  return issues.filter((i) => i.pageId === pageId && i.tileIds.includes(tileId));
}

/** How many errors and warnings a list holds. */
export function countIssues(issues: readonly PanelIssue[]): { errors: number; warnings: number } {
  let errors = 0;
  for (const issue of issues) if (issue.severity === 'error') errors += 1;
  return { errors, warnings: issues.length - errors };
}

// ---- rules ----------------------------------------------------------------------------------------

function describeTile(tile: Tile): string {
  const kind = TILE_CATALOGUE[tile.kind].label.toLowerCase();
  return tile.label.trim() === '' ? `A ${kind}` : `${tileDisplayName(tile)} (${kind})`;
}

function targetIssues(doc: PanelDocument, page: Page, season: SeasonProfile | undefined): PanelIssue[] {
  const screen = deviceSize(doc.device);
  const at = `${screen.widthPx} × ${screen.heightPx} ${doc.device.orientation} in run mode`;
  const issues: PanelIssue[] = [];
  for (const tile of page.tiles) {
    const targets = tileTouchTargets(tile, doc.device, doc.grid, { season });
    if (targets.length === 0) continue;
    const smallest = targets.reduce((a, b) => (Math.min(b.widthPx, b.heightPx) < Math.min(a.widthPx, a.heightPx) ? b : a));
    const sidePx = Math.min(smallest.widthPx, smallest.heightPx);
    if (sidePx >= TARGET_ENHANCED_PX) continue;
    const isError = sidePx < TARGET_MINIMUM_PX;
    const what = targets.length === 1 ? 'its tap area is' : tile.kind === 'reef-picker' ? 'its branch buttons are' : 'its buttons are';
    // Floor the shown size so a 43.6 px button never reads as 44 px.
    const size = `${Math.floor(smallest.widthPx)} × ${Math.floor(smallest.heightPx)} px`;
    const message = isError
      ? `${describeTile(tile)}: ${what} ${size} at ${at}, below the 24 × 24 px minimum (WCAG 2.5.8). Make the tile larger or give it fewer options.`
      : `${describeTile(tile)}: ${what} ${size} at ${at}, under the 44 × 44 px that fingers hit reliably (WCAG 2.5.5). Make the tile larger.`;
    const rule = isError ? 'target-below-24' : 'target-below-44';
    issues.push({ id: `${rule}:${page.id}:${tile.id}`, rule, severity: isError ? 'error' : 'warning', pageId: page.id, tileIds: [tile.id], message });
  }
  return issues;
}

function contrastIssues(theme: Theme, page: Page): PanelIssue[] {
  const issues: PanelIssue[] = [];
  for (const tile of page.tiles) {
    const ratio = contrastRatio(theme[tile.ink], theme[tile.fill]);
    if (ratio >= TEXT_CONTRAST_MINIMUM) continue;
    issues.push({
      id: `low-contrast:${page.id}:${tile.id}`,
      rule: 'low-contrast',
      severity: 'warning',
      pageId: page.id,
      tileIds: [tile.id],
      message: `${describeTile(tile)}: its text (${THEME_COLOUR_NAMES[tile.ink]} on ${THEME_COLOUR_NAMES[tile.fill]}) has a contrast of ${formatContrastRatio(ratio)}; text needs at least 4.5:1 (WCAG 1.4.3).`,
    });
  }
  for (const tile of page.tiles) {
    // Readouts past a threshold draw their value in Warn or Danger, the match clock its last 20 s in Warn.
    const states: { colour: ThemeColour; when: string }[] =
      tile.kind === 'readout' && tile.thresholds
        ? [
            { colour: 'warn', when: 'past its warn threshold its value turns' },
            { colour: 'danger', when: 'past its danger threshold its value turns' },
          ]
        : tile.kind === 'match-clock'
          ? [{ colour: 'warn', when: 'in the last 20 s it turns' }]
          : [];
    for (const state of states) {
      if (state.colour === tile.ink) continue;
      const ratio = contrastRatio(theme[state.colour], theme[tile.fill]);
      if (ratio >= TEXT_CONTRAST_MINIMUM) continue;
      issues.push({
        id: `low-contrast:${page.id}:${tile.id}:${state.colour}`,
        rule: 'low-contrast',
        severity: 'warning',
        pageId: page.id,
        tileIds: [tile.id],
        message: `${describeTile(tile)}: ${state.when} ${THEME_COLOUR_NAMES[state.colour]} on ${THEME_COLOUR_NAMES[tile.fill]}, a contrast of ${formatContrastRatio(ratio)}; text needs at least 4.5:1 (WCAG 1.4.3).`,
      });
    }
  }
  const buttonTiles = page.tiles.filter((t) => tileWrites(t).length > 0 && t.kind !== 'reef-picker');
  if (buttonTiles.length > 0) {
    for (const pair of BUTTON_TEXT_PAIRS) {
      const ratio = contrastRatio(theme[pair.ink], theme[pair.fill]);
      if (ratio >= TEXT_CONTRAST_MINIMUM) continue;
      issues.push({
        id: `low-contrast:${page.id}:buttons-${pair.state}`,
        rule: 'low-contrast',
        severity: 'warning',
        pageId: page.id,
        tileIds: buttonTiles.map((t) => t.id),
        message: `Buttons ${pair.state === 'idle' ? 'not chosen' : 'chosen'} draw ${THEME_COLOUR_NAMES[pair.ink]} on ${THEME_COLOUR_NAMES[pair.fill]} at ${formatContrastRatio(ratio)}; text needs at least 4.5:1 (WCAG 1.4.3). Change the theme's ${THEME_COLOUR_NAMES[pair.ink]} or ${THEME_COLOUR_NAMES[pair.fill]} colour.`,
      });
    }
  }
  return issues;
}

function overlapIssues(page: Page): PanelIssue[] {
  const issues: PanelIssue[] = [];
  page.tiles.forEach((a, i) => {
    for (const b of page.tiles.slice(i + 1)) {
      if (!cellRectsOverlap(a, b)) continue;
      issues.push({
        id: `overlap:${page.id}:${a.id}+${b.id}`,
        rule: 'overlap',
        severity: 'error',
        pageId: page.id,
        tileIds: [a.id, b.id],
        message: `${describeTile(a)} and ${describeTile(b)} overlap on page ‘${page.name}’; one would cover the other. Move one of them.`,
      });
    }
  });
  return issues;
}

function isBlank(channel: unknown): boolean {
  return typeof channel !== 'string' || channel.trim() === '';
}

function channelIssues(page: Page): PanelIssue[] {
  const issues: PanelIssue[] = [];
  for (const tile of page.tiles) {
    if (!kindNeedsChannel(tile.kind)) continue;
    const missing =
      tile.kind === 'target-echo'
        ? !Array.isArray(tile.channels) || tile.channels.length === 0 || tile.channels.some(isBlank)
        : isBlank((tile as { channel?: unknown }).channel);
    if (!missing) continue;
    const does = tileWrites(tile).length > 0 ? 'writes to' : 'shows';
    issues.push({
      id: `no-channel:${page.id}:${tile.id}`,
      rule: 'no-channel',
      severity: 'error',
      pageId: page.id,
      tileIds: [tile.id],
      message:
        tile.kind === 'target-echo'
          ? `${describeTile(tile)} names no channel to echo (or an empty one). Pick the selection channels it summarises.`
          : `${describeTile(tile)} is bound to no channel. Choose the channel it ${does}.`,
    });
  }
  return issues;
}

type Writer = { page: Page; tile: Tile; use: ChannelUse };

function describeUse(use: ChannelUse): string {
  return use.values ? `${use.type} (${use.values.join(', ')})` : use.type;
}

function sameValues(a: ChannelUse, b: ChannelUse): boolean {
  if (!a.values || !b.values) return a.values === b.values;
  const setA = new Set(a.values);
  const setB = new Set(b.values);
  return setA.size === setB.size && [...setA].every((v) => setB.has(v));
}

/** Every tile writing each channel, across all pages (they publish to the same relay channel). */
export function writersByChannel(doc: PanelDocument): Map<string, Writer[]> {
  const writers = new Map<string, Writer[]>();
  for (const page of doc.pages) {
    for (const tile of page.tiles) {
      for (const use of tileWrites(tile)) {
        if (isBlank(use.channel)) continue;
        const list = writers.get(use.channel) ?? [];
        list.push({ page, tile, use });
        writers.set(use.channel, list);
      }
    }
  }
  return writers;
}

function clashIssues(doc: PanelDocument): PanelIssue[] {
  const issues: PanelIssue[] = [];
  for (const [channel, writers] of writersByChannel(doc)) {
    const first = writers[0]!;
    const typeClash = writers.find((w) => w.use.type !== first.use.type);
    const valueClash = typeClash ? undefined : writers.find((w) => !sameValues(w.use, first.use));
    const other = typeClash ?? valueClash;
    if (!other) continue;
    const where = (w: Writer) => `${describeTile(w.tile)}${doc.pages.length > 1 ? ` on ‘${w.page.name}’` : ''}`;
    let detail: string;
    if (typeClash) {
      detail = `${where(first)} writes ${first.use.type} values but ${where(other)} writes ${other.use.type} values`;
    } else {
      const a = new Set(first.use.values ?? []);
      const b = new Set(other.use.values ?? []);
      const onlyFirst = [...a].filter((v) => !b.has(v));
      const onlyOther = [...b].filter((v) => !a.has(v));
      const parts = [
        onlyFirst.length > 0 ? `only ${where(first)} offers ${onlyFirst.join(', ')}` : '',
        onlyOther.length > 0 ? `only ${where(other)} offers ${onlyOther.join(', ')}` : '',
      ].filter(Boolean);
      detail = `${where(first)} writes ${describeUse(first.use)} but ${where(other)} writes ${describeUse(other.use)}: ${parts.join('; ')}`;
    }
    const rule = 'type-clash' as const;
    const message = `Two tiles write ${channel} differently: ${detail}. The robot reads one kind of value per channel; make them agree or use another channel.`;
    const tileIds = writers.map((w) => w.tile.id);
    for (const page of doc.pages.filter((p) => writers.some((w) => w.page === p))) {
      issues.push({ id: `${rule}:${page.id}:${channel}`, rule, severity: 'error', pageId: page.id, tileIds, message });
    }
  }
  return issues;
}

/** Whether a robot reading `reads` reads `channel` (exact names; an entry ending in `/` is a prefix). */
export function robotReadsChannel(reads: readonly string[], channel: string): boolean {
  return reads.some((r) => (r.endsWith('/') ? channel.startsWith(r) : r === channel));
}

function unreadIssues(doc: PanelDocument, reads: readonly string[]): PanelIssue[] {
  const issues: PanelIssue[] = [];
  for (const [channel, writers] of writersByChannel(doc)) {
    if (robotReadsChannel(reads, channel)) continue;
    for (const page of doc.pages) {
      const here = writers.filter((w) => w.page === page);
      if (here.length === 0) continue;
      const names = here.map((w) => describeTile(w.tile));
      issues.push({
        id: `robot-does-not-read:${page.id}:${channel}`,
        rule: 'robot-does-not-read',
        severity: 'warning',
        pageId: page.id,
        tileIds: here.map((w) => w.tile.id),
        message: `The connected robot does not read ${channel}, so ${names.join(' and ')} ${here.length === 1 ? 'changes' : 'change'} nothing on it. Check the channel name against the robot code, or add it there.`,
      });
    }
  }
  return issues;
}
