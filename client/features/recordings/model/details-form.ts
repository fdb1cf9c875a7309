// Pure: the recording details form. Text as typed → the PATCH body, checked with the shared metadata rules.
import { z } from 'zod';
import type { FieldIssue } from '../../../../shared/schemas/error';
import { recordingKindSchema, recordingMetadataSchema, type RecordingDetail, type RecordingPatch } from '../../../../shared/schemas/recording';

/** Input names, equal to the paths of the server's field issues (`metadata.station`). */
export const DETAILS_FIELDS = [
  'kind',
  'metadata.event',
  'metadata.matchType',
  'metadata.matchNumber',
  'metadata.alliance',
  'metadata.station',
  'metadata.operatorName',
  'metadata.tags',
  'metadata.notes',
] as const;
export type DetailsField = (typeof DETAILS_FIELDS)[number];
export type DetailsValues = Record<DetailsField, string>;

const shape = recordingMetadataSchema.shape;

const isBlank = (v: unknown) => typeof v === 'string' && v.trim() === '';
/** Blank is "not said" (null); other text goes to the shared rule as typed. */
const optionalText = <T extends z.ZodType>(rule: T) => z.preprocess((v) => (isBlank(v) ? null : v), rule);
/** Blank is "not said"; other text must read as a number and pass the shared rule. */
const optionalWhole = <T extends z.ZodType>(rule: T) =>
  z.preprocess((v) => (isBlank(v) ? null : typeof v === 'string' ? Number(v.trim()) : v), rule);

/** "qual, fast  ,,defense" → ["qual", "fast", "defense"]: trimmed, blanks dropped, each once. */
export function parseTags(text: string): string[] {
  return [...new Set(text.split(',').map((t) => t.trim()).filter(Boolean))];
}

/** Tags reported on the tags field itself (the shared rule's issues point at one tag: `metadata.tags.2`). */
const tagsText = z
  .string()
  .transform(parseTags)
  .superRefine((tags, ctx) => {
    const parsed = shape.tags.safeParse(tags);
    if (!parsed.success) ctx.addIssue({ code: 'custom', message: parsed.error.issues[0]!.message });
  });

export const detailsFormSchema = z
  .object({
    kind: recordingKindSchema,
    'metadata.event': optionalText(shape.event),
    'metadata.matchType': optionalText(shape.matchType),
    'metadata.matchNumber': optionalWhole(shape.matchNumber),
    'metadata.alliance': optionalText(shape.alliance),
    'metadata.station': optionalWhole(shape.station),
    'metadata.operatorName': optionalText(shape.operatorName),
    'metadata.tags': tagsText,
    'metadata.notes': shape.notes,
  })
  .transform(
    (v): RecordingPatch => ({
      kind: v.kind,
      metadata: {
        event: v['metadata.event'],
        matchType: v['metadata.matchType'],
        matchNumber: v['metadata.matchNumber'],
        alliance: v['metadata.alliance'],
        station: v['metadata.station'],
        operatorName: v['metadata.operatorName'],
        tags: v['metadata.tags'],
        notes: v['metadata.notes'],
      },
    }),
  );

/** The recording as form text; null is blank. */
export function formFromRecording(r: Pick<RecordingDetail, 'kind' | 'metadata'>): DetailsValues {
  const m = r.metadata;
  const text = (v: string | number | null) => (v === null ? '' : String(v));
  return {
    kind: r.kind,
    'metadata.event': text(m.event),
    'metadata.matchType': text(m.matchType),
    'metadata.matchNumber': text(m.matchNumber),
    'metadata.alliance': text(m.alliance),
    'metadata.station': text(m.station),
    'metadata.operatorName': text(m.operatorName),
    'metadata.tags': m.tags.join(', '),
    'metadata.notes': m.notes,
  };
}

/** Whether the form says something other than the saved recording; text that doesn't parse always differs. */
export function hasDetailChanges(values: DetailsValues, saved: Pick<RecordingDetail, 'kind' | 'metadata'>): boolean {
  const parsed = detailsFormSchema.safeParse(values);
  if (!parsed.success) return true;
  const now = formFromRecording({ kind: parsed.data.kind ?? saved.kind, metadata: { ...saved.metadata, ...parsed.data.metadata } });
  const before = formFromRecording(saved);
  return DETAILS_FIELDS.some((f) => now[f] !== before[f]);
}

/** Server issue paths moved onto the form's fields: one tag's issue (`metadata.tags.3`) belongs to the tags field. */
export function issuesOnFields(issues: readonly FieldIssue[]): FieldIssue[] {
  return issues.map((i) => ({ ...i, path: i.path.replace(/(\.\d+)+$/, '') }));
}
