// Pure: imports only shared files. Where the reef picker draws the reef and its twelve branch buttons, in view
// metres (origin at the reef centre, +x to the operator's right, +y away from the operator).
import { wrapDeg, type Point2d } from '../../../shared/domain/geometry/pose2d';
import { faceLabels, formatFaceLabel, type FaceLabelScheme } from '../../../shared/domain/season/face-labels';
import { reefBranches, reefFaces, reefOutline } from '../../../shared/domain/season/reef-faces';
import { reefViewTransform, viewAngleDeg } from '../../../shared/domain/season/reef-view';
import type { Alliance, DriverStation, SeasonProfile } from '../../../shared/domain/season/season-profile';

export type ReefPickerOrientation = 'operator' | 'field';

export type ReefPickerBranch = {
  letter: string;
  faceIndex: number;
  /** The branch itself on the reef, view metres. */
  atM: Point2d;
  /** Direction of the branch from the reef centre in the view, degrees counter-clockwise from +x. */
  angleDeg: number;
  /** The button's ring sector, counter-clockwise from `fromDeg` to `toDeg` (toDeg − fromDeg = 30). */
  fromDeg: number;
  toDeg: number;
};

export type ReefPickerFace = {
  faceIndex: number;
  /** Direction of the face's outward normal in the view. */
  normalDeg: number;
  label: string;
  isNear: boolean;
};

export type ReefPickerLayout = {
  alliance: Alliance;
  /** Hexagon corners at the tag plane, view metres. */
  outline: Point2d[];
  faces: ReefPickerFace[];
  branches: ReefPickerBranch[];
  /** Centre-to-corner distance of the hexagon, metres. */
  circumradiusM: number;
};

/**
 * The reef of `alliance` as the operator at `station` sees it (`operator`: the near face flat at the bottom)
 * or as the field layout draws it (`field`: blue alliance wall on the left, no turn). Each branch owns the
 * half of its face's 60° sector on its own side, so the twelve sectors tile the full circle.
 */
export function reefPickerLayout(
  season: SeasonProfile,
  alliance: Alliance,
  station: DriverStation,
  orientation: ReefPickerOrientation,
  scheme: FaceLabelScheme,
): ReefPickerLayout {
  const operatorView = reefViewTransform(season, alliance, station, 'near-face');
  const centre = operatorView.centre;
  const rotationDeg = orientation === 'operator' ? operatorView.rotationDeg : 0;
  const view = { rotationDeg };
  const toView = orientation === 'operator' ? operatorView.toView : (p: Point2d) => ({ xM: p.xM - centre.xM, yM: p.yM - centre.yM });
  const labels = faceLabels(season, alliance, station);
  const faces = reefFaces(season, alliance).map((face) => ({
    faceIndex: face.faceIndex,
    normalDeg: viewAngleDeg(view, face.normalDeg),
    label: formatFaceLabel(labels[face.faceIndex]!, scheme),
    isNear: face.faceIndex === operatorView.nearFaceIndex,
  }));
  const branches = reefBranches(season, alliance).map((b) => {
    const atM = toView({ xM: b.xM, yM: b.yM });
    const angleDeg = (Math.atan2(atM.yM, atM.xM) * 180) / Math.PI;
    const normalDeg = faces[b.faceIndex]!.normalDeg;
    const isCounterClockwise = wrapDeg(angleDeg - normalDeg) > 0;
    const fromDeg = isCounterClockwise ? normalDeg : normalDeg - 30;
    return { letter: b.letter, faceIndex: b.faceIndex, atM, angleDeg, fromDeg, toDeg: fromDeg + 30 };
  });
  const circumradiusM = season.reefs[alliance].centreToFaceM.value / Math.cos(Math.PI / 6);
  return { alliance, outline: reefOutline(season, alliance).map(toView), faces, branches, circumradiusM };
}

/** SVG path (screen y down) of a ring sector between radii `innerR` and `outerR`, angles in view degrees. */
export function ringSectorPath(fromDeg: number, toDeg: number, innerR: number, outerR: number): string {
  const at = (r: number, deg: number) => {
    const rad = (deg * Math.PI) / 180;
    return `${round(r * Math.cos(rad))} ${round(-r * Math.sin(rad))}`;
  };
  // Screen y runs down, so a counter-clockwise view sweep is SVG sweep-flag 0.
  return [
    `M ${at(outerR, fromDeg)}`,
    `A ${outerR} ${outerR} 0 0 0 ${at(outerR, toDeg)}`,
    `L ${at(innerR, toDeg)}`,
    `A ${innerR} ${innerR} 0 0 1 ${at(innerR, fromDeg)}`,
    'Z',
  ].join(' ');
}

const round = (v: number) => Math.round(v * 10000) / 10000;
