import { describe, expect, it } from 'vitest';
import { season2025 } from './season-2025';
import { seasonProfileSchema, type AprilTag } from './season-profile';

const tag = (id: number): AprilTag => {
  const t = season2025.tags.find((s) => s.value.id === id);
  if (!t) throw new Error(`no tag ${id}`);
  return t.value;
};

const L = 17.548; // [FL] field length, welded perimeter
const W = 8.052; // [FL] field width, welded perimeter

describe('seasonProfileSchema', () => {
  it('accepts the 2025 profile', () => {
    expect(seasonProfileSchema.safeParse(season2025).success).toBe(true);
  });

  it('rejects a profile whose reef lists five tags', () => {
    const broken = structuredClone(season2025);
    broken.reefs.blue.tagIdsCcw.value = [18, 17, 22, 21, 20];
    expect(seasonProfileSchema.safeParse(broken).success).toBe(false);
  });
});

describe('season2025', () => {
  it('has the welded-perimeter field size 17.548 × 8.052 m [FL]', () => {
    expect(season2025.field.lengthM.value).toBe(L);
    expect(season2025.field.widthM.value).toBe(W);
  });

  it('has all 22 AprilTags, ids 1 to 22 once each [FL]', () => {
    const ids = season2025.tags.map((t) => t.value.id).sort((a, b) => a - b);
    expect(ids).toEqual(Array.from({ length: 22 }, (_, i) => i + 1));
  });

  // FACTS.md: 180° rotational symmetry about the field centre, red = (L − x, W − y, yaw + 180°),
  // for pairs 1↔13 … 11↔20, within 2 mm (derived from [FL]).
  it.each([
    [1, 13],
    [2, 12],
    [3, 16],
    [4, 15],
    [5, 14],
    [6, 19],
    [7, 18],
    [8, 17],
    [9, 22],
    [10, 21],
    [11, 20],
  ])('tag %d is tag %d turned 180° about the field centre, within 2 mm', (redId, blueId) => {
    const red = tag(redId);
    const blue = tag(blueId);
    expect(Math.abs(red.xM - (L - blue.xM))).toBeLessThan(0.002);
    expect(Math.abs(red.yM - (W - blue.yM))).toBeLessThan(0.002);
    expect(red.zM).toBeCloseTo(blue.zM, 6);
    expect((((red.yawDeg - blue.yawDeg - 180) % 360) + 360) % 360).toBe(0);
  });

  it.each([
    [12, 'coral-station', 'blue'],
    [3, 'processor', 'red'],
    [16, 'processor', 'blue'],
    [4, 'barge', 'red'],
    [14, 'barge', 'blue'],
    [7, 'reef', 'red'],
    [21, 'reef', 'blue'],
  ])('tags %d as %s of the %s alliance [FL table]', (id, element, alliance) => {
    expect(tag(id)).toMatchObject({ element, alliance });
  });

  // FACTS.md: reef centre = mean of its six tags, (4.489323, 4.025900) blue / (13.058902, 4.025900) red [FL derived].
  it.each([
    ['blue', 4.489323, 4.0259],
    ['red', 13.058902, 4.0259],
  ] as const)('puts the %s reef centre at the mean of its six tags, (%f, %f)', (alliance, xM, yM) => {
    const reef = season2025.reefs[alliance];
    const tags = reef.tagIdsCcw.value.map(tag);
    const meanX = tags.reduce((s, t) => s + t.xM, 0) / 6;
    const meanY = tags.reduce((s, t) => s + t.yM, 0) / 6;
    expect(meanX).toBeCloseTo(xM, 5);
    expect(meanY).toBeCloseTo(yM, 5);
    expect(reef.centre.value.xM).toBeCloseTo(xM, 6);
    expect(reef.centre.value.yM).toBeCloseTo(yM, 6);
  });

  // FACTS.md: centre to face 0.8317 m on the x-axis faces, 0.8309 m on the slanted faces [FL derived]. [FL] rounds
  // to 0.01 in (0.254 mm), so allow a quarter millimetre: the red x-axis faces measure 0.831596 m.
  it.each(['blue', 'red'] as const)('puts every %s reef tag 0.8317 m (x-axis) or 0.8309 m (slanted) from the centre', (alliance) => {
    const c = season2025.reefs[alliance].centre.value;
    for (const id of season2025.reefs[alliance].tagIdsCcw.value) {
      const t = tag(id);
      const expected = t.yawDeg % 180 === 0 ? 0.8317 : 0.8309;
      expect(Math.abs(Math.hypot(t.xM - c.xM, t.yM - c.yM) - expected)).toBeLessThan(0.00025);
    }
  });

  // FACTS.md: tag order counter-clockwise seen from above: blue 18 → 17 → 22 → 21 → 20 → 19; red 7 → 8 → 9 → 10 → 11 → 6.
  it.each([
    ['blue', [18, 17, 22, 21, 20, 19]],
    ['red', [7, 8, 9, 10, 11, 6]],
  ] as const)('lists the %s reef tags counter-clockwise as %o', (alliance, ids) => {
    const reef = season2025.reefs[alliance];
    expect(reef.tagIdsCcw.value).toEqual(ids);
    const c = reef.centre.value;
    const angles = ids.map((id) => (Math.atan2(tag(id).yM - c.yM, tag(id).xM - c.xM) * 180) / Math.PI);
    for (let i = 0; i < 6; i++) {
      const step = ((((angles[(i + 1) % 6] ?? 0) - (angles[i] ?? 0)) % 360) + 360) % 360;
      expect(step).toBeCloseTo(60, 1);
    }
  });

  it.each([
    ['blue', 180],
    ['red', 0],
  ] as const)("starts the %s reef's face order on the face toward its own wall (normal %d°)", (alliance, normalDeg) => {
    const first = season2025.reefs[alliance].tagIdsCcw.value[0] ?? 0;
    expect(tag(first).yawDeg).toBe(normalDeg);
  });

  // From memory (FACTS.md, med): L1 1 ft 6 in, L2 2 ft 7⅞ in, L3 3 ft 11⅝ in, L4 6 ft; 1 in = 0.0254 m.
  it.each([
    ['L1', 0.4572],
    ['L2', 0.809625],
    ['L3', 1.209675],
    ['L4', 1.8288],
  ] as const)('puts %s at %f m (from memory)', (level, heightM) => {
    expect(season2025.reef.levels[level].value.heightM).toBeCloseTo(heightM, 6);
    expect(season2025.reef.levels[level].fromMemory).toBe(true);
  });

  // From memory (FACTS.md, med): branches 1 ft 1 in = 0.3302 m apart, ±0.1651 m from the face centre.
  it('puts branches ±0.1651 m from the face centre (from memory)', () => {
    expect(season2025.reef.branchLateralOffsetM.value).toBeCloseTo(0.1651, 6);
  });

  // [GM] table 6-2, from memory (FACTS.md).
  it.each([
    ['L1', 3, 2],
    ['L2', 4, 3],
    ['L3', 6, 4],
    ['L4', 7, 5],
  ] as const)('scores coral on %s at %d in auto and %d in teleop (from memory)', (level, autoPoints, teleopPoints) => {
    expect(season2025.scoring.coral[level].value).toEqual({ autoPoints, teleopPoints });
  });

  it('has auto 15 s, teleop 135 s and a 20 s endgame [GM 4; endgame from memory]', () => {
    expect(season2025.phases.autoDurationS.value).toBe(15);
    expect(season2025.phases.teleopDurationS.value).toBe(135);
    expect(season2025.phases.endgameDurationS.value).toBe(20);
    expect(season2025.phases.endgameDurationS.fromMemory).toBe(true);
  });

  it('wraps every number in a sourced value, and nothing recalled claims high confidence', () => {
    const unsourced: string[] = [];
    let sourcedCount = 0;
    const walk = (node: unknown, path: string, isInsideSourced: boolean) => {
      if (typeof node === 'number' && !isInsideSourced) unsourced.push(path);
      if (node === null || typeof node !== 'object') return;
      const isSourced = 'value' in node && 'source' in node && 'confidence' in node && 'fromMemory' in node;
      if (isSourced) {
        sourcedCount += 1;
        const s = node as { source: string; confidence: string; fromMemory: boolean };
        expect(s.source.length, path).toBeGreaterThan(0);
        if (s.fromMemory) expect(s.confidence, path).not.toBe('high');
      }
      for (const [k, v] of Object.entries(node)) walk(v, `${path}.${k}`, isInsideSourced || isSourced);
    };
    const { year: _year, ...rest } = season2025;
    walk(rest, 'season2025', false);
    expect(unsourced).toEqual([]);
    expect(sourcedCount).toBeGreaterThan(50);
  });
});
