// Pure: imports only zod-derived shared files. Every tile kind the designer's palette offers: its name, what it
// is for, its default and smallest size in cells, and a factory for a new tile with sensible defaults (the
// standard op/ channels and their exact values from shared/domain/channels.ts). Also which channels a tile
// writes and reads, with the value type: what the panel check and the channel contract are built from.
//
// A readout, lamp or match clock channel `robot/<signal>` shows the robot's telemetry signal `<signal>`
// (the simulator's are listed in simulator/src/signals.ts, e.g. `battery/voltage` in V).
import { algaeChoiceSchema, BRANCH_LETTERS, cageChoiceSchema, coralStationChoiceSchema } from '../channels';
import { REEF_LEVELS } from '../season/season-profile';
import type { Theme, ThemeColour, Tile, TileKind, TileOf, TileOption } from '../../schemas/panel';
import { THEME_COLOURS } from '../../schemas/panel';
import { contrastRatio } from './contrast';

export type ChannelValueType = 'string' | 'boolean' | 'number' | 'json';
/** One channel a tile writes or reads; `values` lists the only strings it carries, when it is one of a set. */
export type ChannelUse = { channel: string; type: ChannelValueType; values?: string[] };

export type TileCatalogueEntry<K extends TileKind = TileKind> = {
  /** The kind's name in the palette and in messages, e.g. "Reef picker". */
  label: string;
  /** One line on what the tile is for. */
  description: string;
  /** Size in cells of a tile dropped from the palette. */
  defaultSize: { w: number; h: number };
  /** The smallest size in cells the designer lets it be resized to. */
  minSize: { w: number; h: number };
  /**
   * A new tile at cell `at` with the default size. With a theme, the text colour is the theme colour that
   * reads best on the tile's fill (so a restyled theme still gives legible new tiles).
   */
  create(id: string, at: { x: number; y: number }, theme?: Theme): TileOf<K>;
};

/** Pitwall's default panel colours, from the app's asphalt-and-signal palette (client/app/styles.css). */
export const DEFAULT_PANEL_THEME: Theme = {
  canvas: '#0c0e10',
  surface: '#1d2228',
  text: '#eef1f4',
  accent: '#f5a30f',
  accentText: '#121519',
  ok: '#2fbf8f',
  warn: '#ffbb3d',
  danger: '#ff7a59',
  muted: '#8893a0',
};

/** Theme colour names as the designer shows them. */
export const THEME_COLOUR_NAMES: Record<ThemeColour, string> = {
  canvas: 'Canvas',
  surface: 'Surface',
  text: 'Text',
  accent: 'Accent',
  accentText: 'Accent text',
  ok: 'OK',
  warn: 'Warn',
  danger: 'Danger',
  muted: 'Muted',
};

/** The default channel of each writing or reading kind. */
export const DEFAULT_CHANNELS = {
  'reef-picker': 'op/reef/branch',
  'level-picker': 'op/reef/level',
  'station-picker': 'op/station',
  'algae-picker': 'op/algae',
  'cage-picker': 'op/cage',
  'push-pad': 'op/intake/eject',
  'latch-pad': 'op/drive/slow-mode',
  'choice-pad': 'op/auto/routine',
  lamp: 'robot/intake/coral-sensor',
  readout: 'robot/battery/voltage',
  'match-clock': 'robot/match/remaining',
} as const satisfies Partial<Record<TileKind, string>>;

const TITLE: Record<string, string> = {
  left: 'Left',
  right: 'Right',
  none: 'None',
  processor: 'Processor',
  net: 'Net',
  park: 'Park',
  shallow: 'Shallow',
  deep: 'Deep',
};
const optionsOf = (values: readonly string[]): TileOption[] => values.map((value) => ({ label: TITLE[value] ?? value, value }));

/** The levels top to bottom, as the reef stands: L4 first. */
const LEVEL_OPTIONS: TileOption[] = [...REEF_LEVELS].reverse().map((value) => ({ label: value, value }));

/** The ink that reads best on `fill` in `theme`; `preferred` wins whenever it passes 4.5:1. */
function inkFor(fill: ThemeColour, preferred: ThemeColour, theme: Theme | undefined): ThemeColour {
  if (!theme) return preferred;
  if (contrastRatio(theme[preferred], theme[fill]) >= 4.5) return preferred;
  let best: ThemeColour = preferred;
  for (const name of THEME_COLOURS) {
    if (name !== fill && contrastRatio(theme[name], theme[fill]) > contrastRatio(theme[best], theme[fill])) best = name;
  }
  return best;
}

function base(id: string, at: { x: number; y: number }, size: { w: number; h: number }, label: string, fill: ThemeColour, ink: ThemeColour, theme?: Theme) {
  return { id, x: at.x, y: at.y, w: size.w, h: size.h, label, fill, ink: inkFor(fill, ink, theme) };
}

function entry<K extends TileKind>(
  kind: K,
  spec: Omit<TileCatalogueEntry<K>, 'create'> & {
    fill: ThemeColour;
    ink: ThemeColour;
    tileLabel: string;
    rest: () => Omit<TileOf<K>, 'id' | 'x' | 'y' | 'w' | 'h' | 'label' | 'fill' | 'ink' | 'kind'>;
  },
): TileCatalogueEntry<K> {
  return {
    label: spec.label,
    description: spec.description,
    defaultSize: spec.defaultSize,
    minSize: spec.minSize,
    create: (id, at, theme) =>
      ({ ...base(id, at, spec.defaultSize, spec.tileLabel, spec.fill, spec.ink, theme), kind, ...spec.rest() }) as unknown as TileOf<K>,
  };
}

export const TILE_CATALOGUE: { [K in TileKind]: TileCatalogueEntry<K> } = {
  'reef-picker': entry('reef-picker', {
    label: 'Reef picker',
    description: 'The reef as the operator sees it; tap one of the 12 branches (A–L).',
    // 5 × 5 cells of the starter grid's 80 px give branch buttons over 44 px; 4 × 4 would not (touch-targets.ts).
    defaultSize: { w: 5, h: 5 },
    minSize: { w: 3, h: 3 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Branch',
    rest: () => ({ channel: DEFAULT_CHANNELS['reef-picker'], labelScheme: 'letters', orientation: 'operator' }),
  }),
  'level-picker': entry('level-picker', {
    label: 'Level picker',
    description: 'Reef levels stacked L4 at the top to L1 (trough) at the bottom; tap one.',
    defaultSize: { w: 2, h: 4 },
    minSize: { w: 1, h: 2 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Level',
    rest: () => ({ channel: DEFAULT_CHANNELS['level-picker'], options: LEVEL_OPTIONS.map((o) => ({ ...o })) }),
  }),
  'station-picker': entry('station-picker', {
    label: 'Station picker',
    description: 'Which coral station to collect from next: left or right.',
    defaultSize: { w: 3, h: 1 },
    minSize: { w: 2, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Station',
    rest: () => ({ channel: DEFAULT_CHANNELS['station-picker'], options: optionsOf(coralStationChoiceSchema.options) }),
  }),
  'algae-picker': entry('algae-picker', {
    label: 'Algae picker',
    description: 'What to do with algae: leave it, the processor or the net.',
    defaultSize: { w: 3, h: 1 },
    minSize: { w: 2, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Algae',
    rest: () => ({ channel: DEFAULT_CHANNELS['algae-picker'], options: optionsOf(algaeChoiceSchema.options) }),
  }),
  'cage-picker': entry('cage-picker', {
    label: 'Cage picker',
    description: 'The endgame plan: none, park, shallow cage or deep cage.',
    defaultSize: { w: 4, h: 1 },
    minSize: { w: 2, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Cage',
    rest: () => ({ channel: DEFAULT_CHANNELS['cage-picker'], options: optionsOf(cageChoiceSchema.options) }),
  }),
  'push-pad': entry('push-pad', {
    label: 'Push pad',
    description: 'Momentary button: true while held, false on release.',
    defaultSize: { w: 2, h: 1 },
    minSize: { w: 1, h: 1 },
    fill: 'accent',
    ink: 'accentText',
    tileLabel: 'Eject',
    rest: () => ({ channel: DEFAULT_CHANNELS['push-pad'] }),
  }),
  'latch-pad': entry('latch-pad', {
    label: 'Latch pad',
    description: 'On/off switch: each tap flips it.',
    defaultSize: { w: 2, h: 1 },
    minSize: { w: 1, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Slow mode',
    rest: () => ({ channel: DEFAULT_CHANNELS['latch-pad'] }),
  }),
  'choice-pad': entry('choice-pad', {
    label: 'Choice pad',
    description: 'One of several named choices, e.g. the auto routine.',
    defaultSize: { w: 3, h: 2 },
    minSize: { w: 2, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Auto routine',
    rest: () => ({
      channel: DEFAULT_CHANNELS['choice-pad'],
      options: [
        { label: 'Leave only', value: 'leave' },
        { label: 'One coral', value: 'one-coral' },
        { label: 'Two coral', value: 'two-coral' },
      ],
    }),
  }),
  lamp: entry('lamp', {
    label: 'Lamp',
    description: 'A robot true/false shown as a light, e.g. coral in the intake.',
    defaultSize: { w: 2, h: 1 },
    minSize: { w: 1, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Coral held',
    rest: () => ({ channel: DEFAULT_CHANNELS.lamp, onColour: 'ok', offColour: 'muted' }),
  }),
  readout: entry('readout', {
    label: 'Readout',
    description: 'A robot number with its unit, turning warn or danger past its thresholds.',
    defaultSize: { w: 2, h: 1 },
    minSize: { w: 1, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Battery',
    // Volts under load: warn below 11.5 V, danger below 10.5 V (team rule of thumb, from memory; the roboRIO
    // itself browns out near 6.8 V).
    rest: () => ({ channel: DEFAULT_CHANNELS.readout, unit: 'V', decimals: 1, thresholds: { direction: 'below', warn: 11.5, danger: 10.5 } }),
  }),
  'match-clock': entry('match-clock', {
    label: 'Match clock',
    description: 'Seconds left in the match, from the robot.',
    defaultSize: { w: 2, h: 1 },
    minSize: { w: 2, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Time left',
    rest: () => ({ channel: DEFAULT_CHANNELS['match-clock'] }),
  }),
  caption: entry('caption', {
    label: 'Caption',
    description: 'Fixed words on the panel: a heading or a reminder. Writes and reads nothing.',
    defaultSize: { w: 3, h: 1 },
    minSize: { w: 1, h: 1 },
    fill: 'canvas',
    ink: 'text',
    tileLabel: 'Caption',
    rest: () => ({ text: 'Scoring', size: 'm' }),
  }),
  'target-echo': entry('target-echo', {
    label: 'Target echo',
    description: 'The current selection in large type and whether the robot has it.',
    defaultSize: { w: 4, h: 2 },
    minSize: { w: 2, h: 1 },
    fill: 'surface',
    ink: 'text',
    tileLabel: 'Target',
    rest: () => ({ channels: ['op/reef/branch', 'op/reef/level'] }),
  }),
};

/** The palette's groups and order: what the operator taps first, then what they read. */
export const PALETTE_GROUPS: { name: string; kinds: TileKind[] }[] = [
  { name: 'Targets', kinds: ['reef-picker', 'level-picker', 'station-picker', 'algae-picker', 'cage-picker'] },
  { name: 'Pads', kinds: ['push-pad', 'latch-pad', 'choice-pad'] },
  { name: 'Robot', kinds: ['target-echo', 'lamp', 'readout', 'match-clock'] },
  { name: 'Text', kinds: ['caption'] },
];
/** Every kind once, in palette order. */
export const PALETTE_ORDER: TileKind[] = PALETTE_GROUPS.flatMap((g) => g.kinds);

/** The values a picker or choice pad writes, in order: the reef picker's 12 branch letters, else its option values. */
export function tileValues(tile: Tile): string[] | undefined {
  switch (tile.kind) {
    case 'reef-picker':
      return [...BRANCH_LETTERS];
    case 'level-picker':
    case 'station-picker':
    case 'algae-picker':
    case 'cage-picker':
    case 'choice-pad':
      return tile.options.map((o) => o.value);
    default:
      return undefined;
  }
}

/** The channels a tile publishes when tapped. Pickers and choice pads write strings from their values; pads booleans. */
export function tileWrites(tile: Tile): ChannelUse[] {
  switch (tile.kind) {
    case 'reef-picker':
    case 'level-picker':
    case 'station-picker':
    case 'algae-picker':
    case 'cage-picker':
    case 'choice-pad':
      return [{ channel: tile.channel, type: 'string', values: tileValues(tile) }];
    case 'push-pad':
    case 'latch-pad':
      return [{ channel: tile.channel, type: 'boolean' }];
    case 'lamp':
    case 'readout':
    case 'match-clock':
    case 'caption':
    case 'target-echo':
      return [];
  }
}

/**
 * The channels a tile shows. Lamps read booleans; readouts numbers (text when they have neither a unit nor
 * thresholds, typed 'json' = any value); the match clock reads seconds; the target echo reads the
 * selection channels it echoes ('json' here: the contract takes the type of the tile that writes them).
 */
export function tileReads(tile: Tile): ChannelUse[] {
  switch (tile.kind) {
    case 'lamp':
      return [{ channel: tile.channel, type: 'boolean' }];
    case 'readout':
      return [{ channel: tile.channel, type: tile.unit.trim() !== '' || tile.thresholds ? 'number' : 'json' }];
    case 'match-clock':
      return [{ channel: tile.channel, type: 'number' }];
    case 'target-echo':
      return tile.channels.map((channel) => ({ channel, type: 'json' as const }));
    case 'reef-picker':
    case 'level-picker':
    case 'station-picker':
    case 'algae-picker':
    case 'cage-picker':
    case 'choice-pad':
    case 'push-pad':
    case 'latch-pad':
    case 'caption':
      return [];
  }
}

/** Whether a tile of this kind must be bound to a channel (every kind but the caption). */
export function kindNeedsChannel(kind: TileKind): boolean {
  return kind !== 'caption';
}

/** A tile's name in messages: its label in quotes, or its kind's name when it has no label. */
export function tileDisplayName(tile: Pick<Tile, 'label' | 'kind'>): string {
  const label = tile.label.trim();
  return label === '' ? TILE_CATALOGUE[tile.kind].label.toLowerCase() : `‘${label}’`;
}
