// Pure: imports only relative shared files. Reef faces, branches and outline derived from a season profile's tags.
import { rotateVector, unitVector, type Point2d } from '../geometry/pose2d';
import type { Alliance, AprilTag, SeasonProfile } from './season-profile';

export type ReefFace = {
  /** Position in the reef's counter-clockwise tag order; 0 is the face toward the alliance's own wall. */
  faceIndex: number;
  tagId: number;
  /** Face centre at the tag plane, field metres. */
  xM: number;
  yM: number;
  /** Outward normal of the face, the tag's yaw. */
  normalDeg: number;
  /** [left, right] branch letters as seen by someone facing this face. */
  branchLetters: readonly [string, string];
};

export type ReefBranch = {
  letter: string;
  faceIndex: number;
  tagId: number;
  /** Branch position in the face plane, field metres. */
  xM: number;
  yM: number;
  normalDeg: number;
  /** −1 for the left branch, +1 for the right, as seen facing the face. */
  sideSign: -1 | 1;
};

/** The tag with this id; throws if the profile lacks it (a data error, not an input error). */
export function tagById(season: SeasonProfile, id: number): AprilTag {
  const found = season.tags.find((t) => t.value.id === id);
  if (!found) throw new Error(`Season ${season.id} has no AprilTag ${id}`);
  return found.value;
}

/** Offset in metres along a face: positive is to the left of someone facing a surface whose normal is normalDeg. */
export function alongFace(normalDeg: number, leftOfViewerM: number): Point2d {
  const u = unitVector(normalDeg - 90);
  return { xM: u.xM * leftOfViewerM, yM: u.yM * leftOfViewerM };
}

/** The six faces of an alliance's reef, counter-clockwise from the face toward its own wall. */
export function reefFaces(season: SeasonProfile, alliance: Alliance): ReefFace[] {
  const letters = season.reef.branchLetters.value;
  return season.reefs[alliance].tagIdsCcw.value.map((tagId, faceIndex) => {
    const t = tagById(season, tagId);
    return {
      faceIndex,
      tagId,
      xM: t.xM,
      yM: t.yM,
      normalDeg: t.yawDeg,
      branchLetters: [letters[2 * faceIndex] ?? '?', letters[2 * faceIndex + 1] ?? '?'] as const,
    };
  });
}

/** The twelve branches of an alliance's reef in letter order, each ±branchLateralOffsetM from its face centre. */
export function reefBranches(season: SeasonProfile, alliance: Alliance): ReefBranch[] {
  const offsetM = season.reef.branchLateralOffsetM.value;
  return reefFaces(season, alliance).flatMap((face) =>
    ([-1, 1] as const).map((sideSign, i) => {
      const d = alongFace(face.normalDeg, -sideSign * offsetM);
      return {
        letter: face.branchLetters[i] ?? '?',
        faceIndex: face.faceIndex,
        tagId: face.tagId,
        xM: face.xM + d.xM,
        yM: face.yM + d.yM,
        normalDeg: face.normalDeg,
        sideSign,
      };
    }),
  );
}

/** Hexagon corners (metres) of an alliance's reef at the tag plane, counter-clockwise, from its centre and face distance. */
export function reefOutline(season: SeasonProfile, alliance: Alliance): Point2d[] {
  const reef = season.reefs[alliance];
  const c = reef.centre.value;
  const circumradiusM = reef.centreToFaceM.value / Math.cos(Math.PI / 6);
  return reefFaces(season, alliance).map((face) => {
    const v = rotateVector({ xM: circumradiusM, yM: 0 }, face.normalDeg - 30);
    return { xM: c.xM + v.xM, yM: c.yM + v.yM };
  });
}
