// Pure: imports only zod and shared files. The panel document — what the designer edits, every version
// stores, the export file carries and run mode draws — and the panels API contract.
import { z } from 'zod';
import { channelSchema } from '../protocol/messages';
import { roleSchema } from '../domain/roles';

/** The export file's `format` and the document schema's version; bump the version on a breaking change. */
export const PANEL_FORMAT = 'pitwall.panel';
export const PANEL_FORMAT_VERSION = 1;

// ---- device and grid ------------------------------------------------------------------------------

/** Tablet sizes in CSS pixels (landscape). `custom` takes the width and height as given. */
export const DEVICE_PRESETS = {
  'tablet-1280x800': { label: 'Tablet 1280 × 800', widthPx: 1280, heightPx: 800 },
  'tablet-1180x820': { label: 'Tablet 1180 × 820', widthPx: 1180, heightPx: 820 },
  'tablet-1920x1200': { label: 'Tablet 1920 × 1200', widthPx: 1920, heightPx: 1200 },
  'tablet-1024x768': { label: 'Tablet 1024 × 768', widthPx: 1024, heightPx: 768 },
} as const;
export type DevicePreset = keyof typeof DEVICE_PRESETS;
export const devicePresetSchema = z.enum(['tablet-1280x800', 'tablet-1180x820', 'tablet-1920x1200', 'tablet-1024x768', 'custom']);

export const deviceSchema = z.object({
  preset: devicePresetSchema,
  /** The screen's CSS width and height in landscape; portrait swaps them. */
  widthPx: z.number().int().min(320, 'A device is at least 320 px wide').max(4096, 'A device is at most 4096 px wide'),
  heightPx: z.number().int().min(240, 'A device is at least 240 px high').max(4096, 'A device is at most 4096 px high'),
  orientation: z.enum(['landscape', 'portrait']),
});
export type Device = z.infer<typeof deviceSchema>;

/** The canvas is `columns × rows` equal cells filling the device; tiles snap to cells. */
export const gridSchema = z.object({
  columns: z.number().int().min(4).max(48),
  rows: z.number().int().min(3).max(48),
  /** Space between tiles in CSS px (drawn inside each cell's edge). */
  gapPx: z.number().int().min(0).max(32),
});
export type Grid = z.infer<typeof gridSchema>;

// ---- theme ----------------------------------------------------------------------------------------

const hexColour = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'A colour is #rrggbb');

/** Named colours of a panel. Tiles refer to them by name, so one theme change restyles the panel. */
export const THEME_COLOURS = ['canvas', 'surface', 'text', 'accent', 'accentText', 'ok', 'warn', 'danger', 'muted'] as const;
export const themeColourSchema = z.enum(THEME_COLOURS);
export type ThemeColour = z.infer<typeof themeColourSchema>;
export const themeSchema = z.object(
  Object.fromEntries(THEME_COLOURS.map((name) => [name, hexColour])) as Record<ThemeColour, typeof hexColour>,
);
export type Theme = z.infer<typeof themeSchema>;

// ---- tiles ----------------------------------------------------------------------------------------

/** A tile's place on the grid, in cells from the top-left. */
const placement = {
  id: z.string().min(1).max(64),
  x: z.number().int().min(0),
  y: z.number().int().min(0),
  w: z.number().int().min(1),
  h: z.number().int().min(1),
  label: z.string().max(80),
  /** Background and text colours from the theme. */
  fill: themeColourSchema,
  ink: themeColourSchema,
};

/** How the reef picker names faces (shared/domain/season/face-labels.ts) and which way it is turned. */
export const reefLabelSchemeSchema = z.enum(['letters', 'compass', 'relative', 'clock']);
export const reefOrientationSchema = z.enum(['operator', 'field']);

const option = z.object({ label: z.string().min(1).max(40), value: z.string().min(1).max(64) });
export type TileOption = z.infer<typeof option>;

export const reefPickerTileSchema = z.object({
  ...placement,
  kind: z.literal('reef-picker'),
  channel: channelSchema,
  labelScheme: reefLabelSchemeSchema,
  /** `operator`: rotated to what the operator sees from their driver station; `field`: blue wall on the left. */
  orientation: reefOrientationSchema,
});
export const levelPickerTileSchema = z.object({
  ...placement,
  kind: z.literal('level-picker'),
  channel: channelSchema,
  /** The levels offered, top to bottom (e.g. L4 … L1). */
  options: z.array(option).min(1).max(8),
});
export const stationPickerTileSchema = z.object({ ...placement, kind: z.literal('station-picker'), channel: channelSchema, options: z.array(option).min(1).max(8) });
export const algaePickerTileSchema = z.object({ ...placement, kind: z.literal('algae-picker'), channel: channelSchema, options: z.array(option).min(1).max(8) });
export const cagePickerTileSchema = z.object({ ...placement, kind: z.literal('cage-picker'), channel: channelSchema, options: z.array(option).min(1).max(8) });
/** Momentary: publishes `true` while pressed and `false` on release. */
export const pushPadTileSchema = z.object({ ...placement, kind: z.literal('push-pad'), channel: channelSchema });
/** On/off: each tap flips the published boolean. */
export const latchPadTileSchema = z.object({ ...placement, kind: z.literal('latch-pad'), channel: channelSchema });
/** One of N strings, e.g. the auto routine. */
export const choicePadTileSchema = z.object({ ...placement, kind: z.literal('choice-pad'), channel: channelSchema, options: z.array(option).min(2).max(12) });
/** A robot boolean shown as a light. */
export const lampTileSchema = z.object({ ...placement, kind: z.literal('lamp'), channel: channelSchema, onColour: themeColourSchema, offColour: themeColourSchema });
/** A robot number or text with its unit; numbers past a threshold turn warn / danger. */
export const readoutTileSchema = z.object({
  ...placement,
  kind: z.literal('readout'),
  channel: channelSchema,
  unit: z.string().max(12),
  decimals: z.number().int().min(0).max(4),
  thresholds: z
    .object({
      /** `below`: low is bad (battery volts); `above`: high is bad (motor temperature). */
      direction: z.enum(['below', 'above']),
      warn: z.number().finite(),
      danger: z.number().finite(),
    })
    .nullable(),
});
/** The match clock from a robot channel carrying seconds left (e.g. robot/match/time). */
export const matchClockTileSchema = z.object({ ...placement, kind: z.literal('match-clock'), channel: channelSchema });
export const captionTileSchema = z.object({ ...placement, kind: z.literal('caption'), text: z.string().max(200), size: z.enum(['s', 'm', 'l']) });
/** Big summary of the current selection (the channels it echoes) and whether the robot has it. */
export const targetEchoTileSchema = z.object({ ...placement, kind: z.literal('target-echo'), channels: z.array(channelSchema).min(1).max(6) });

export const tileSchema = z.discriminatedUnion('kind', [
  reefPickerTileSchema,
  levelPickerTileSchema,
  stationPickerTileSchema,
  algaePickerTileSchema,
  cagePickerTileSchema,
  pushPadTileSchema,
  latchPadTileSchema,
  choicePadTileSchema,
  lampTileSchema,
  readoutTileSchema,
  matchClockTileSchema,
  captionTileSchema,
  targetEchoTileSchema,
]);
export type Tile = z.infer<typeof tileSchema>;
export type TileKind = Tile['kind'];
export type TileOf<K extends TileKind> = Extract<Tile, { kind: K }>;
export const TILE_KINDS = tileSchema.options.map((o) => o.shape.kind.value) as TileKind[];

export const pageSchema = z.object({
  id: z.string().min(1).max(64),
  name: z.string().trim().min(1, 'Name the page').max(40),
  tiles: z.array(tileSchema).max(200, 'A page holds at most 200 tiles'),
});
export type Page = z.infer<typeof pageSchema>;

/** What one version of a panel holds. */
export const panelDocumentSchema = z.object({
  device: deviceSchema,
  grid: gridSchema,
  theme: themeSchema,
  pages: z.array(pageSchema).min(1, 'A panel has at least one page').max(8, 'A panel has at most 8 pages'),
});
export type PanelDocument = z.infer<typeof panelDocumentSchema>;

/** The export / import file. */
export const panelFileSchema = z.object({
  format: z.literal(PANEL_FORMAT, { message: `Not a Pitwall panel file (format must be "${PANEL_FORMAT}")` }),
  version: z.literal(PANEL_FORMAT_VERSION, { message: `Unsupported panel file version (this Pitwall reads version ${PANEL_FORMAT_VERSION})` }),
  name: z.string().trim().min(1).max(80),
  exportedAt: z.string().datetime({ offset: true }),
  document: panelDocumentSchema,
});
export type PanelFile = z.infer<typeof panelFileSchema>;

// ---- API ------------------------------------------------------------------------------------------

const person = z.object({ id: z.string().uuid(), name: z.string(), role: roleSchema.nullable() });

export const panelVersionSummarySchema = z.object({
  id: z.string().uuid(),
  /** 1, 2, 3 … per panel. */
  number: z.number().int().positive(),
  author: person,
  createdAt: z.string().datetime({ offset: true }),
  /** Optional words from the author about the change. */
  message: z.string(),
});
export type PanelVersionSummary = z.infer<typeof panelVersionSummarySchema>;

export const panelSummarySchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  device: deviceSchema,
  /** The newest version: what the designer opens. */
  latestVersion: panelVersionSummarySchema,
  /** The version the driver station runs, if any. */
  publishedVersion: panelVersionSummarySchema.nullable(),
  /** Whether this is the team's published panel (one per team). */
  isTeamPanel: z.boolean(),
  tileCount: z.number().int().nonnegative(),
  createdAt: z.string().datetime({ offset: true }),
});
export type PanelSummary = z.infer<typeof panelSummarySchema>;
export const panelListSchema = z.object({ panels: z.array(panelSummarySchema) });

export const panelSchema = panelSummarySchema.extend({ document: panelDocumentSchema });
export type Panel = z.infer<typeof panelSchema>;

export const panelNameSchema = z.string().trim().min(1, 'Name the panel').max(80, 'Use at most 80 characters');

export const createPanelBodySchema = z.object({
  name: panelNameSchema,
  /** Omitted: the starter document for the device. */
  document: panelDocumentSchema.optional(),
  /** The device of the starter document when `document` is omitted (default: the 1280 × 800 tablet, landscape). */
  device: deviceSchema.optional(),
});
export type CreatePanelBody = z.infer<typeof createPanelBodySchema>;

/** Save a new version. `baseVersionId` is the version the edit started from; a stale one gets 409. */
export const updatePanelBodySchema = z.object({
  baseVersionId: z.string().uuid(),
  name: panelNameSchema.optional(),
  document: panelDocumentSchema.optional(),
  message: z.string().trim().max(200).optional(),
});
export type UpdatePanelBody = z.infer<typeof updatePanelBodySchema>;

/** `POST /api/panels/:id/duplicate`; without a name the copy is called "<name> (copy)". */
export const duplicatePanelBodySchema = z.object({ name: panelNameSchema.optional() });
export type DuplicatePanelBody = z.infer<typeof duplicatePanelBodySchema>;

export const publishPanelBodySchema = z.object({ versionId: z.string().uuid({ message: 'Not a version id' }) });
export const panelVersionListSchema = z.object({ versions: z.array(panelVersionSummarySchema) });
export const panelVersionSchema = panelVersionSummarySchema.extend({ document: panelDocumentSchema });
export type PanelVersion = z.infer<typeof panelVersionSchema>;

/**
 * A stale `PUT` answers 409 with the usual error body plus `current`: the version that is current now, so
 * the client can show it and nothing typed is lost.
 */
export const panelConflictSchema = z.object({ current: panelVersionSchema });

/** What run mode loads: the team's published panel at its published version. */
export const publishedPanelSchema = z.object({
  panelId: z.string().uuid(),
  name: z.string(),
  version: panelVersionSchema,
});
export type PublishedPanel = z.infer<typeof publishedPanelSchema>;

export const panelParamsSchema = z.object({ id: z.string().uuid({ message: 'Not a panel id' }) });
