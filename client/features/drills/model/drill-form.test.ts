import { describe, expect, it } from 'vitest';
import { bodyFromForm, formFromDrill, NEW_DRILL_FORM, paceSummary, parseScript, parseScriptLine, planSummary, toggleFace } from './drill-form';

describe('parseScriptLine', () => {
  it.each([
    ['C L4', { branch: 'C', level: 'L4' }],
    ['l4 c', { branch: 'C', level: 'L4' }],
    ['L4 · C', { branch: 'C', level: 'L4' }],
    ['branch h', { branch: 'H' }],
    ['L2', { level: 'L2' }],
    ['left', { station: 'left' }],
    ['Right station', { station: 'right' }],
  ])('reads “%s”', (line, call) => {
    expect(parseScriptLine(line)).toEqual(call);
  });

  it.each(['M L4', 'left C', 'C D', 'L5'])('explains what is wrong with “%s”', (line) => {
    expect(typeof parseScriptLine(line)).toBe('string');
  });
});

describe('parseScript', () => {
  it('reads calls by line or comma and names the first bad one', () => {
    expect(parseScript('C L4, left\nJ L3')).toEqual({ calls: [{ branch: 'C', level: 'L4' }, { station: 'left' }, { branch: 'J', level: 'L3' }] });
    expect(parseScript('C L4\nQ')).toEqual({ error: expect.stringMatching(/^Call 2: /) });
    expect(parseScript('  \n ')).toEqual({ error: 'Script at least one call' });
  });
});

describe('bodyFromForm', () => {
  it('turns the default form into a random drill at a 4 s interval', () => {
    expect(bodyFromForm({ ...NEW_DRILL_FORM, name: 'Warm-up' })).toEqual({
      body: {
        name: 'Warm-up',
        plan: { mode: 'random', targets: { branches: ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'I', 'J', 'K', 'L'], levels: ['L2', 'L3', 'L4'], stations: [] }, count: 10 },
        pace: { mode: 'interval', intervalMs: 4000 },
      },
    });
  });

  it('gives a message per field', () => {
    const result = bodyFromForm({ ...NEW_DRILL_FORM, name: ' ', branches: [], levels: [], count: '2.5', intervalS: '0.5' });
    expect('errors' in result && result.errors).toMatchObject({ name: 'Name the drill', targets: 'Choose at least one target', count: expect.any(String), intervalS: 'Give at least 1 s between calls' });
    const scripted = bodyFromForm({ ...NEW_DRILL_FORM, name: 'S', mode: 'scripted', script: 'Z', paceMode: 'on-answer', limitS: '' });
    expect('errors' in scripted && scripted.errors).toMatchObject({ script: expect.stringMatching(/^Call 1/), limitS: expect.any(String) });
  });

  it('round-trips a stored drill through the form', () => {
    const drill = {
      id: '6f1d2c3b-4a59-4e8f-9b0a-1c2d3e4f5a6b',
      name: 'Cycle rhythm',
      plan: { mode: 'scripted' as const, calls: [{ station: 'left' as const }, { branch: 'C' as const, level: 'L4' as const }] },
      pace: { mode: 'on-answer' as const, limitMs: 7500 },
      createdBy: { id: null, name: 'Hana Whitcombe' },
      createdAt: '2025-03-01T10:00:00Z',
      updatedAt: '2025-03-01T10:00:00Z',
      resultCount: 0,
    };
    expect(bodyFromForm(formFromDrill(drill))).toEqual({ body: { name: drill.name, plan: drill.plan, pace: drill.pace } });
  });
});

describe('toggleFace', () => {
  it('adds both branches of a face, or removes them when both are in', () => {
    expect(toggleFace(['A'], ['C', 'D'])).toEqual(['A', 'C', 'D']);
    expect(toggleFace(['A', 'C', 'D'], ['C', 'D'])).toEqual(['A']);
    expect(toggleFace(['C'], ['C', 'D'])).toEqual(['C', 'D']);
  });
});

describe('planSummary and paceSummary', () => {
  it('summarises a drill in a line', () => {
    expect(planSummary({ mode: 'random', targets: { branches: ['G', 'H'], levels: ['L4'], stations: ['left', 'right'] }, count: 8 })).toBe('8 random calls · branches G H · L4 · both stations');
    expect(planSummary({ mode: 'scripted', calls: [{ station: 'left' }, { branch: 'C', level: 'L4' }, { level: 'L2' }, { branch: 'A' }] })).toBe('4 scripted calls: Left station, L4 · C, L2 …');
    expect(paceSummary({ mode: 'interval', intervalMs: 3500 })).toBe('A call every 3.5 s');
    expect(paceSummary({ mode: 'on-answer', limitMs: 8000 })).toBe('Next call on answer · 8 s to answer');
  });
});
