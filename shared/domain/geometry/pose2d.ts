// Pure: imports nothing. 2-D rigid poses in field metres and degrees (counter-clockwise from +x).

export type Point2d = { xM: number; yM: number };
export type Pose2d = { xM: number; yM: number; headingDeg: number };

const DEG_PER_RAD = 180 / Math.PI;

/** Degrees to radians. */
export const degToRad = (angleDeg: number): number => angleDeg / DEG_PER_RAD;

/** Radians to degrees. */
export const radToDeg = (angleRad: number): number => angleRad * DEG_PER_RAD;

/** Wraps an angle in degrees into (−180, 180]; 180 stays 180, −180 becomes 180. */
export function wrapDeg(angleDeg: number): number {
  const wrapped = angleDeg - 360 * Math.floor((angleDeg + 180) / 360);
  return wrapped === -180 ? 180 : wrapped;
}

/** Wraps an angle in radians into (−π, π]; −π becomes π. */
export function wrapRad(angleRad: number): number {
  const wrapped = angleRad - 2 * Math.PI * Math.floor((angleRad + Math.PI) / (2 * Math.PI));
  return wrapped === -Math.PI ? Math.PI : wrapped;
}

/** Rotates a vector (metres) counter-clockwise by angleDeg about the origin. */
export function rotateVector(v: Point2d, angleDeg: number): Point2d {
  const c = Math.cos(degToRad(angleDeg));
  const s = Math.sin(degToRad(angleDeg));
  return { xM: v.xM * c - v.yM * s, yM: v.xM * s + v.yM * c };
}

/** Unit vector (length 1 m) pointing along angleDeg. */
export function unitVector(angleDeg: number): Point2d {
  return { xM: Math.cos(degToRad(angleDeg)), yM: Math.sin(degToRad(angleDeg)) };
}

/** Maps a point given in `pose`'s local frame (x forward, y left, metres) into the frame `pose` lives in. */
export function transformPoint(pose: Pose2d, local: Point2d): Point2d {
  const r = rotateVector(local, pose.headingDeg);
  return { xM: pose.xM + r.xM, yM: pose.yM + r.yM };
}

/** Pose `b` (expressed in `a`'s frame) expressed in `a`'s parent frame: a ∘ b; heading wrapped to (−180, 180]. */
export function composePose(a: Pose2d, b: Pose2d): Pose2d {
  const p = transformPoint(a, b);
  return { xM: p.xM, yM: p.yM, headingDeg: wrapDeg(a.headingDeg + b.headingDeg) };
}

/** The pose that undoes `p`: composePose(p, inversePose(p)) is the identity. */
export function inversePose(p: Pose2d): Pose2d {
  const r = rotateVector({ xM: -p.xM, yM: -p.yM }, -p.headingDeg);
  return { xM: r.xM, yM: r.yM, headingDeg: wrapDeg(-p.headingDeg) };
}

/** Pose `to` as seen from pose `from` (both in the same frame): inverse(from) ∘ to. */
export function relativePose(from: Pose2d, to: Pose2d): Pose2d {
  return composePose(inversePose(from), to);
}

/** Straight-line distance in metres between two points (or poses; headings ignored). */
export function distanceM(a: Point2d, b: Point2d): number {
  return Math.hypot(b.xM - a.xM, b.yM - a.yM);
}

/** Direction in degrees, (−180, 180], from point `a` toward point `b`; 0 when they coincide. */
export function bearingDeg(a: Point2d, b: Point2d): number {
  return wrapDeg(radToDeg(Math.atan2(b.yM - a.yM, b.xM - a.xM)));
}

/** Smallest signed angle in degrees, (−180, 180], that turns `fromDeg` onto `toDeg`. */
export function angleDiffDeg(fromDeg: number, toDeg: number): number {
  return wrapDeg(toDeg - fromDeg);
}
