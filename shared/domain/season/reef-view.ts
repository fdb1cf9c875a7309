// Pure: imports only relative shared files. Rotating a reef drawing to match what the operator sees from a driver station.
import { angleDiffDeg, bearingDeg, rotateVector, wrapDeg, type Point2d } from '../geometry/pose2d';
import { reefFaces } from './reef-faces';
import type { Alliance, DriverStation, SeasonProfile } from './season-profile';

/**
 * 'near-face': the face nearest the operator sits flat at the bottom (the panel's reef picker).
 * 'sightline': exactly the operator's line of sight to the reef centre points up.
 */
export type ReefViewMode = 'near-face' | 'sightline';

export type ReefView = {
  alliance: Alliance;
  driverStation: DriverStation;
  mode: ReefViewMode;
  /** Counter-clockwise rotation applied to field directions to get view directions. */
  rotationDeg: number;
  /** Reef centre in field metres; it maps to the view origin. */
  centre: Point2d;
  nearFaceIndex: number;
  /** Field metres → view metres: origin at the reef centre, +y away from the operator, +x to the operator's right. */
  toView: (field: Point2d) => Point2d;
  /** View metres → field metres (the inverse of toView). */
  toField: (view: Point2d) => Point2d;
};

/** Field position in metres of a driver station (its point on the alliance wall); throws if the profile lacks it. */
export function driverStationPosition(season: SeasonProfile, alliance: Alliance, station: DriverStation): Point2d {
  const found = season.driverStations[alliance].value.find((d) => d.station === station);
  if (!found) throw new Error(`Season ${season.id} has no ${alliance} driver station ${station}`);
  return { xM: found.xM, yM: found.yM };
}

/** Index (counter-clockwise order) of the reef face whose outward normal points most nearly at the driver station. */
export function nearFaceIndex(season: SeasonProfile, alliance: Alliance, station: DriverStation): number {
  const centre = season.reefs[alliance].centre.value;
  const towardStationDeg = bearingDeg(centre, driverStationPosition(season, alliance, station));
  let best = { faceIndex: 0, offDeg: Infinity };
  for (const face of reefFaces(season, alliance)) {
    const offDeg = Math.abs(angleDiffDeg(face.normalDeg, towardStationDeg));
    if (offDeg < best.offDeg) best = { faceIndex: face.faceIndex, offDeg };
  }
  return best.faceIndex;
}

/** The view of an alliance's reef from one driver station; rotationDeg in (−180, 180]. */
export function reefViewTransform(
  season: SeasonProfile,
  alliance: Alliance,
  station: DriverStation,
  mode: ReefViewMode = 'near-face',
): ReefView {
  const centre = season.reefs[alliance].centre.value;
  const nearIndex = nearFaceIndex(season, alliance, station);
  const rotationDeg =
    mode === 'near-face'
      ? wrapDeg(270 - (reefFaces(season, alliance)[nearIndex]?.normalDeg ?? 0))
      : wrapDeg(90 - bearingDeg(driverStationPosition(season, alliance, station), centre));
  return {
    alliance,
    driverStation: station,
    mode,
    rotationDeg,
    centre,
    nearFaceIndex: nearIndex,
    toView: (p) => rotateVector({ xM: p.xM - centre.xM, yM: p.yM - centre.yM }, rotationDeg),
    toField: (v) => {
      const r = rotateVector(v, -rotationDeg);
      return { xM: r.xM + centre.xM, yM: r.yM + centre.yM };
    },
  };
}

/** A field direction (degrees) as a direction in the view, (−180, 180]. */
export function viewAngleDeg(view: Pick<ReefView, 'rotationDeg'>, fieldAngleDeg: number): number {
  return wrapDeg(fieldAngleDeg + view.rotationDeg);
}

