// Pure: imports nothing. Trapezoidal (or, for short moves, triangular) motion profiles from rest to rest.

export type MotionLimits = {
  /** Top speed, m/s; must be > 0. */
  maxSpeedMps: number;
  /** Acceleration and deceleration magnitude, m/s²; must be > 0. */
  maxAccelMps2: number;
};

export type MotionProfile = {
  /** Signed distance in metres; the sign is the direction of travel. */
  distanceM: number;
  maxAccelMps2: number;
  /** Highest speed reached (magnitude), m/s: the top speed, or less when the move is triangular. */
  peakSpeedMps: number;
  accelDurationS: number;
  cruiseDurationS: number;
  durationS: number;
  isTriangular: boolean;
};

export type MotionState = { positionM: number; velocityMps: number };

/** Profile for a signed distance in metres; zero distance takes 0 s. Throws RangeError for non-positive or non-finite limits. */
export function planMotionProfile(distanceM: number, limits: MotionLimits): MotionProfile {
  const { maxSpeedMps, maxAccelMps2 } = limits;
  if (!(maxSpeedMps > 0 && maxAccelMps2 > 0 && Number.isFinite(maxSpeedMps) && Number.isFinite(maxAccelMps2))) {
    throw new RangeError('maxSpeedMps and maxAccelMps2 must be finite and > 0');
  }
  if (!Number.isFinite(distanceM)) throw new RangeError('distanceM must be finite');
  const lengthM = Math.abs(distanceM);
  const rampM = (maxSpeedMps * maxSpeedMps) / (2 * maxAccelMps2);
  const isTriangular = lengthM < 2 * rampM;
  const peakSpeedMps = isTriangular ? Math.sqrt(maxAccelMps2 * lengthM) : maxSpeedMps;
  const accelDurationS = peakSpeedMps / maxAccelMps2;
  const cruiseDurationS = isTriangular ? 0 : (lengthM - 2 * rampM) / maxSpeedMps;
  return {
    distanceM,
    maxAccelMps2,
    peakSpeedMps,
    accelDurationS,
    cruiseDurationS,
    durationS: 2 * accelDurationS + cruiseDurationS,
    isTriangular,
  };
}

/** Seconds to cover a signed distance in metres from rest to rest; 0 for zero distance. */
export function motionDurationS(distanceM: number, limits: MotionLimits): number {
  return planMotionProfile(distanceM, limits).durationS;
}

/** Signed position (m) and velocity (m/s) at tS; before 0 it is at rest at 0, after the end at rest at distanceM. */
export function motionStateAt(profile: MotionProfile, tS: number): MotionState {
  const sign = Math.sign(profile.distanceM);
  const a = profile.maxAccelMps2;
  const v = profile.peakSpeedMps;
  const tA = profile.accelDurationS;
  const cruiseEndS = tA + profile.cruiseDurationS;
  if (tS <= 0 || sign === 0) return { positionM: 0, velocityMps: 0 };
  if (tS >= profile.durationS) return { positionM: profile.distanceM, velocityMps: 0 };
  let positionM: number;
  let speedMps: number;
  if (tS < tA) {
    positionM = 0.5 * a * tS * tS;
    speedMps = a * tS;
  } else if (tS < cruiseEndS) {
    positionM = 0.5 * a * tA * tA + v * (tS - tA);
    speedMps = v;
  } else {
    const leftS = profile.durationS - tS;
    positionM = Math.abs(profile.distanceM) - 0.5 * a * leftS * leftS;
    speedMps = a * leftS;
  }
  return { positionM: sign * positionM, velocityMps: sign * speedMps };
}
