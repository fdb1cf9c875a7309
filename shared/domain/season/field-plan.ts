// Pure: imports only relative shared files. Everything a to-scale field drawing needs, in field metres, from a season profile.
import { robotFootprint } from '../geometry/footprint';
import { transformPoint, unitVector, type Point2d } from '../geometry/pose2d';
import { reefBranches, reefOutline, tagById } from './reef-faces';
import { ALLIANCES, type Alliance, type SeasonProfile } from './season-profile';

export type Segment = { from: Point2d; to: Point2d };

export type FieldPlan = {
  lengthM: number;
  widthM: number;
  /** SVG viewBox in metres with y negated (draw inside a scale(1, −1) group so +y is up). */
  viewBox: { minX: number; minY: number; width: number; height: number };
  outline: Point2d[];
  centreLine: Segment;
  reefs: {
    alliance: Alliance;
    outline: Point2d[];
    centre: Point2d;
    branches: { letter: string; at: Point2d; labelAt: Point2d }[];
  }[];
  coralStations: ({ alliance: Alliance; name: string } & Segment)[];
  processors: ({ alliance: Alliance } & Segment)[];
  barge: { corners: Point2d[]; cages: { alliance: Alliance; name: string; at: Point2d }[] };
  startingLines: ({ alliance: Alliance } & Segment)[];
};

/** Drawing length of a processor mark along the wall; a picture size, not a game dimension. */
const PROCESSOR_MARK_M = 0.7;
/** How far outside a branch its letter sits, metres. */
const BRANCH_LABEL_OUT_M = 0.14;

/**
 * Where a line through `point` along directionDeg crosses the edges of the field rectangle [0, L] × [0, W];
 * the point must lie inside. Used for the coral stations, which cut off the field corners.
 */
export function lineAcrossField(point: Point2d, directionDeg: number, lengthM: number, widthM: number): Segment {
  const d = unitVector(directionDeg);
  const exits = (sign: 1 | -1): number => {
    const limits: number[] = [];
    const dx = sign * d.xM;
    const dy = sign * d.yM;
    if (Math.abs(dx) > 1e-12) limits.push(((dx > 0 ? lengthM : 0) - point.xM) / dx);
    if (Math.abs(dy) > 1e-12) limits.push(((dy > 0 ? widthM : 0) - point.yM) / dy);
    return Math.min(...limits);
  };
  const forwardM = exits(1);
  const backM = exits(-1);
  return {
    from: { xM: point.xM - d.xM * backM, yM: point.yM - d.yM * backM },
    to: { xM: point.xM + d.xM * forwardM, yM: point.yM + d.yM * forwardM },
  };
}

/** The drawing plan of a season's field; marginM of empty space is left around the perimeter. */
export function fieldPlan(season: SeasonProfile, marginM = 0.3): FieldPlan {
  const L = season.field.lengthM.value;
  const W = season.field.widthM.value;
  const bargeX = season.barge.centreXM.value;
  const { depthM, lengthM: bargeLengthM } = season.barge.sizeM.value;
  const bargeCentre = { xM: bargeX, yM: W / 2, headingDeg: 0 };

  return {
    lengthM: L,
    widthM: W,
    viewBox: { minX: -marginM, minY: -(W + marginM), width: L + 2 * marginM, height: W + 2 * marginM },
    outline: [
      { xM: 0, yM: 0 },
      { xM: L, yM: 0 },
      { xM: L, yM: W },
      { xM: 0, yM: W },
    ],
    centreLine: { from: { xM: L / 2, yM: 0 }, to: { xM: L / 2, yM: W } },
    reefs: ALLIANCES.map((alliance) => ({
      alliance,
      outline: reefOutline(season, alliance),
      centre: season.reefs[alliance].centre.value,
      branches: reefBranches(season, alliance).map((b) => {
        const out = unitVector(b.normalDeg);
        return {
          letter: b.letter,
          at: { xM: b.xM, yM: b.yM },
          labelAt: { xM: b.xM + out.xM * BRANCH_LABEL_OUT_M, yM: b.yM + out.yM * BRANCH_LABEL_OUT_M },
        };
      }),
    })),
    coralStations: ALLIANCES.flatMap((alliance) =>
      season.coralStations[alliance].value.map((station) => {
        const t = tagById(season, station.tagId);
        return { alliance, name: station.name, ...lineAcrossField(t, t.yawDeg + 90, L, W) };
      }),
    ),
    processors: ALLIANCES.map((alliance) => {
      const t = tagById(season, season.processors[alliance].value.tagId);
      const pose = { xM: t.xM, yM: t.yM, headingDeg: t.yawDeg };
      return {
        alliance,
        from: transformPoint(pose, { xM: 0, yM: PROCESSOR_MARK_M / 2 }),
        to: transformPoint(pose, { xM: 0, yM: -PROCESSOR_MARK_M / 2 }),
      };
    }),
    barge: {
      corners: robotFootprint(bargeCentre, depthM, bargeLengthM).corners,
      cages: ALLIANCES.flatMap((alliance) =>
        season.barge.cages[alliance].value.map((c) => ({ alliance, name: c.name, at: { xM: c.xM, yM: c.yM } })),
      ),
    },
    startingLines: ALLIANCES.map((alliance) => {
      const line = season.startingLines[alliance].value;
      return { alliance, from: { xM: line.xM, yM: line.yMinM }, to: { xM: line.xM, yM: line.yMaxM } };
    }),
  };
}
