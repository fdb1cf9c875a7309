// Reference check: Pitwall's 2-D pose helpers against gl-matrix (a general-purpose geometry library from
// npm), whose mat2d represents the same rigid transforms as 2×3 affine matrices.
import { glMatrix, mat2d, vec2 } from 'gl-matrix';
import { describe, expect, it } from 'vitest';
import { composePose, inversePose, relativePose, transformPoint, type Pose2d } from '../../shared/domain/geometry/pose2d';

// Float32Array by default; plain arrays compute in double precision like Pitwall.
glMatrix.setMatrixArrayType(Array);
const DEG = Math.PI / 180;

function toMat(p: Pose2d): mat2d {
  const m = mat2d.create();
  mat2d.translate(m, m, [p.xM, p.yM]);
  mat2d.rotate(m, m, p.headingDeg * DEG);
  return m;
}

function fromMat(m: mat2d): Pose2d {
  return { xM: m[4], yM: m[5], headingDeg: Math.atan2(m[1], m[0]) / DEG };
}

function expectPoseClose(actual: Pose2d, expected: Pose2d): void {
  expect(actual.xM).toBeCloseTo(expected.xM, 9);
  expect(actual.yM).toBeCloseTo(expected.yM, 9);
  const diff = ((((actual.headingDeg - expected.headingDeg) % 360) + 540) % 360) - 180;
  expect(diff).toBeCloseTo(0, 9);
}

// Poses around the 2025 field (metres, degrees), including headings beyond ±180°.
const POSES: Pose2d[] = [
  { xM: 0, yM: 0, headingDeg: 0 },
  { xM: 4.489323, yM: 4.0259, headingDeg: 120 },
  { xM: 13.058902, yM: 4.0259, headingDeg: -60 },
  { xM: 1.2, yM: 7.1, headingDeg: 306 },
  { xM: -0.5, yM: 2.25, headingDeg: -190 },
];
const PAIRS = POSES.flatMap((a) => POSES.map((b) => [a, b] as const));

describe('pose helpers against gl-matrix mat2d', () => {
  it.each(PAIRS)('composePose(%j, %j) equals the matrix product', (a, b) => {
    const m = mat2d.create();
    mat2d.multiply(m, toMat(a), toMat(b));
    expectPoseClose(composePose(a, b), fromMat(m));
  });

  it.each(POSES)('inversePose(%j) equals the matrix inverse', (p) => {
    const m = mat2d.create();
    mat2d.invert(m, toMat(p));
    expectPoseClose(inversePose(p), fromMat(m));
  });

  it.each(PAIRS)('relativePose(%j, %j) equals inverse(a)·b', (a, b) => {
    const inverse = mat2d.create();
    mat2d.invert(inverse, toMat(a));
    const m = mat2d.create();
    mat2d.multiply(m, inverse, toMat(b));
    expectPoseClose(relativePose(a, b), fromMat(m));
  });

  it.each(POSES)('transformPoint(%j, ·) equals vec2.transformMat2d', (p) => {
    for (const local of [{ xM: 0.5, yM: -0.2 }, { xM: -1.3, yM: 2.7 }]) {
      const out = vec2.transformMat2d(vec2.create(), [local.xM, local.yM], toMat(p));
      const mine = transformPoint(p, local);
      expect(mine.xM).toBeCloseTo(out[0], 9);
      expect(mine.yM).toBeCloseTo(out[1], 9);
    }
  });
});
