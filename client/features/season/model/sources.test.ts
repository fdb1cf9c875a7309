import { describe, expect, it } from 'vitest';
import { season2025 } from '../../../../shared/domain/season/season-2025';
import { groupBySource, isUsedByTargets, labelForPath, sourceEntries } from './sources';

describe('labelForPath', () => {
  it.each([
    ['field.lengthM', 'Field length'],
    ['reefs.red.centreToFaceM', 'Red reef centre-to-face distance'],
    ['reef.levels.L4', 'L4 height'],
    ['scoring.coral.L2', 'L2 coral points'],
    ['barge.cages.blue', 'Blue cages'],
    ['somethingNew.maxReachM', 'Something new max reach'],
  ])('names %s "%s"', (path, label) => {
    expect(labelForPath(path)).toBe(label);
  });
});

describe('sourceEntries', () => {
  const entries = sourceEntries(season2025);

  it('finds every sourced value once, with the 22 tags as one entry', () => {
    const tags = entries.filter((e) => e.path === 'tags');
    expect(tags).toEqual([{ path: 'tags', label: '22 AprilTag poses', source: '[FL] 2025 field layout, welded perimeter', confidence: 'high', fromMemory: false }]);
    expect(new Set(entries.map((e) => e.path)).size).toBe(entries.length);
    expect(entries.map((e) => e.path)).toEqual(expect.arrayContaining(['field.lengthM', 'reef.levels.L1', 'phases.endgameDurationS']));
  });

  it('keeps the from-memory flag and confidence of each value', () => {
    const letters = entries.find((e) => e.path === 'reef.branchLetters');
    expect(letters).toMatchObject({ fromMemory: true, confidence: 'low' });
    const spacing = entries.find((e) => e.path === 'reef.branchLateralOffsetM');
    expect(spacing).toMatchObject({ fromMemory: true, confidence: 'med' });
  });
});

describe('isUsedByTargets', () => {
  it('picks the tags, reef centres and shared reef values the targets are computed from', () => {
    const used = sourceEntries(season2025).filter(isUsedByTargets).map((e) => e.path);
    expect(used).toEqual(expect.arrayContaining(['tags', 'reefs.blue.centre', 'reef.branchLateralOffsetM', 'reef.levels.L4']));
    expect(used).not.toContain('scoring.leave');
    expect(used).not.toContain('field.lengthM');
  });
});

describe('groupBySource', () => {
  it('lists sources recalled from memory first, least confident first', () => {
    const groups = groupBySource(sourceEntries(season2025));
    const firstSolid = groups.findIndex((g) => !g.fromMemory);
    expect(firstSolid).toBeGreaterThan(0);
    expect(groups.slice(firstSolid).every((g) => !g.fromMemory)).toBe(true);
    expect(groups[0]).toMatchObject({ fromMemory: true, confidence: 'low' });
  });

  it('gathers the values of one source together', () => {
    const reefMemory = groupBySource(sourceEntries(season2025)).find((g) => g.source === '[GM] 5.3 reef drawings, from memory');
    expect(reefMemory?.labels).toEqual(['L1 height', 'L2 height', 'L3 height', 'L4 height']);
  });
});
