// Pure: no I/O, clocks or randomness; imports only shared/. Motion legs that may start moving, and paths around an obstacle.
import { motionStateAt, planMotionProfile, type MotionLimits, type MotionProfile, type MotionState } from '../../shared/domain/motion-profile';
import { distanceM, type Point2d } from '../../shared/domain/geometry/pose2d';

/**
 * A move of a signed distance that may start at a speed, built from a shared rest-to-rest profile: a profile that
 * accelerates from rest reaches speed u after u/a seconds and u²/2a metres, so a move of d metres starting at u is
 * the tail, from that moment on, of a rest-to-rest move of d + u²/2a.
 */
export interface Leg {
  profile: MotionProfile;
  /** Time into `profile` at which this leg starts, s. */
  startS: number;
  /** Position in `profile` at which this leg starts, same unit as the distance. */
  startAt: number;
  /** Time from the leg's start to its end, s. */
  durationS: number;
}

/**
 * Plans a leg of signed `distance` starting with signed `speed` along the same axis. A speed away from the target
 * is dropped (the leg starts from rest), and a speed above the limit is clamped to it. When the start speed cannot
 * be shed within the distance at the limit's deceleration, the leg brakes harder (u²/2d) instead of overshooting.
 */
export function planLeg(distance: number, speed: number, limits: MotionLimits): Leg {
  const length = Math.abs(distance);
  const sign = Math.sign(distance);
  const towardTarget = Math.min(limits.maxSpeedMps, Math.max(0, speed * sign));
  if (length === 0 || towardTarget === 0) {
    const profile = planMotionProfile(distance, limits);
    return { profile, startS: 0, startAt: 0, durationS: profile.durationS };
  }
  const stopping = (towardTarget * towardTarget) / (2 * limits.maxAccelMps2);
  if (stopping <= length) {
    const profile = planMotionProfile(sign * (length + stopping), limits);
    const startS = towardTarget / limits.maxAccelMps2;
    return { profile, startS, startAt: sign * stopping, durationS: profile.durationS - startS };
  }
  const brakeAccel = (towardTarget * towardTarget) / (2 * length);
  const profile = planMotionProfile(sign * 2 * length, { maxSpeedMps: limits.maxSpeedMps, maxAccelMps2: brakeAccel });
  const startS = towardTarget / brakeAccel;
  return { profile, startS, startAt: sign * length, durationS: profile.durationS - startS };
}

/** Position (from the leg's start) and velocity tS seconds into a leg; at rest at the end after durationS. */
export function legStateAt(leg: Leg, tS: number): MotionState {
  const s = motionStateAt(leg.profile, leg.startS + Math.max(0, tS));
  return { positionM: s.positionM - leg.startAt, velocityMps: s.velocityMps };
}

export interface Polyline {
  points: Point2d[];
  /** Distance along the line to each point, metres; starts at 0. */
  cumulativeM: number[];
  lengthM: number;
}

/** A polyline through `points` (at least one). */
export function polyline(points: Point2d[]): Polyline {
  const cumulativeM = [0];
  for (let i = 1; i < points.length; i += 1) cumulativeM.push(cumulativeM[i - 1]! + distanceM(points[i - 1]!, points[i]!));
  return { points, cumulativeM, lengthM: cumulativeM[cumulativeM.length - 1]! };
}

/** The point sM metres along a polyline (clamped to its ends) and the unit direction of travel there (0, 0 when it has no length). */
export function pointAlong(line: Polyline, sM: number): { point: Point2d; direction: Point2d } {
  const s = Math.min(line.lengthM, Math.max(0, sM));
  let i = 1;
  while (i < line.points.length - 1 && line.cumulativeM[i]! < s) i += 1;
  const a = line.points[Math.max(0, i - 1)]!;
  const b = line.points[Math.min(i, line.points.length - 1)]!;
  const segmentM = distanceM(a, b);
  if (segmentM === 0) return { point: { xM: b.xM, yM: b.yM }, direction: { xM: 0, yM: 0 } };
  const direction = { xM: (b.xM - a.xM) / segmentM, yM: (b.yM - a.yM) / segmentM };
  const into = s - line.cumulativeM[Math.max(0, i - 1)]!;
  return { point: { xM: a.xM + direction.xM * into, yM: a.yM + direction.yM * into }, direction };
}

/** Shortest distance in metres from point p to the segment a–b. */
export function distanceToSegmentM(p: Point2d, a: Point2d, b: Point2d): number {
  const abx = b.xM - a.xM;
  const aby = b.yM - a.yM;
  const lengthSq = abx * abx + aby * aby;
  const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, ((p.xM - a.xM) * abx + (p.yM - a.yM) * aby) / lengthSq));
  return Math.hypot(p.xM - (a.xM + t * abx), p.yM - (a.yM + t * aby));
}

const MAX_ARC_STEP_RAD = (50 * Math.PI) / 180;
const EXIT_MARGIN = 1.15;

/**
 * Points from `from` to `to` that keep out of the circle (centre, radiusM): the straight line when it is clear,
 * otherwise a radial step out (or in) for an end inside the circle and waypoints around the shorter side of it,
 * placed so that each chord between them just clears the circle.
 */
export function routeAroundCircle(from: Point2d, to: Point2d, centre: Point2d, radiusM: number): Point2d[] {
  if (distanceToSegmentM(centre, from, to) >= radiusM) return [from, to];
  const angleOf = (p: Point2d) => Math.atan2(p.yM - centre.yM, p.xM - centre.xM);
  const onCircle = (angleRad: number, r: number): Point2d => ({
    xM: centre.xM + r * Math.cos(angleRad),
    yM: centre.yM + r * Math.sin(angleRad),
  });
  const startAngle = angleOf(from);
  const endAngle = angleOf(to);
  const head = distanceM(from, centre) < radiusM ? [from, onCircle(startAngle, radiusM * EXIT_MARGIN)] : [from];
  const tail = distanceM(to, centre) < radiusM ? [onCircle(endAngle, radiusM * EXIT_MARGIN), to] : [to];
  let sweep = endAngle - startAngle;
  sweep -= 2 * Math.PI * Math.round(sweep / (2 * Math.PI));
  const steps = Math.max(2, Math.ceil(Math.abs(sweep) / MAX_ARC_STEP_RAD));
  const stepRad = sweep / steps;
  const waypointR = radiusM / Math.cos(stepRad / 2);
  const around: Point2d[] = [];
  for (let k = 1; k < steps; k += 1) around.push(onCircle(startAngle + stepRad * k, waypointR));
  return [...head, ...around, ...tail];
}
