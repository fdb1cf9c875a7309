import { describe, expect, it } from 'vitest';
import { detailsFormSchema, formFromRecording, hasDetailChanges, issuesOnFields, parseTags, type DetailsValues } from './details-form';

const saved = {
  kind: 'match' as const,
  metadata: {
    event: 'Harbor Regional',
    matchType: 'qualification' as const,
    matchNumber: 12,
    alliance: 'red' as const,
    station: 2,
    operatorName: 'Tomas',
    tags: ['fast', 'defense'],
    notes: '',
  },
};
const form = (over: Partial<DetailsValues> = {}): DetailsValues => ({ ...formFromRecording(saved), ...over });

describe('details form', () => {
  it('shows the recording as text', () => {
    expect(formFromRecording(saved)).toEqual({
      kind: 'match',
      'metadata.event': 'Harbor Regional',
      'metadata.matchType': 'qualification',
      'metadata.matchNumber': '12',
      'metadata.alliance': 'red',
      'metadata.station': '2',
      'metadata.operatorName': 'Tomas',
      'metadata.tags': 'fast, defense',
      'metadata.notes': '',
    });
  });

  it('reads text back into the PATCH body, blanks as null', () => {
    const body = detailsFormSchema.parse(form({ 'metadata.matchNumber': ' 7 ', 'metadata.station': '', 'metadata.event': '  ', 'metadata.tags': 'a, ,b,a' }));
    expect(body).toEqual({
      kind: 'match',
      metadata: { event: null, matchType: 'qualification', matchNumber: 7, alliance: 'red', station: null, operatorName: 'Tomas', tags: ['a', 'b'], notes: '' },
    });
  });

  it('puts every problem on its field', () => {
    const parsed = detailsFormSchema.safeParse(form({ 'metadata.matchNumber': '1.5', 'metadata.tags': 'x'.repeat(33) }));
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['metadata.matchNumber', 'The match number is a whole number'],
      ['metadata.tags', 'A tag has at most 32 characters'],
    ]);
    expect(detailsFormSchema.safeParse(form({ 'metadata.matchNumber': 'abc' })).error!.issues[0]!.message).toBe('The match number is a whole number');
  });

  it('knows when something changed', () => {
    expect(hasDetailChanges(form(), saved)).toBe(false);
    expect(hasDetailChanges(form({ 'metadata.tags': 'fast,defense' }), saved)).toBe(false);
    expect(hasDetailChanges(form({ 'metadata.operatorName': 'Hana' }), saved)).toBe(true);
    expect(hasDetailChanges(form({ 'metadata.matchNumber': 'x' }), saved)).toBe(true);
  });

  it('splits tags and moves one tag’s server issue onto the tags field', () => {
    expect(parseTags(' qual ,, fast,qual')).toEqual(['qual', 'fast']);
    expect(issuesOnFields([{ path: 'metadata.tags.3', message: 'm' }, { path: 'metadata.station', message: 's' }])).toEqual([
      { path: 'metadata.tags', message: 'm' },
      { path: 'metadata.station', message: 's' },
    ]);
  });
});
