// Pure: imports only relative shared files. Corners and nose of a rectangle (a robot footprint) at a pose.
import { transformPoint, type Point2d, type Pose2d } from './pose2d';

export type Footprint = {
  /** Corners in field metres, counter-clockwise from front-left. */
  corners: Point2d[];
  /** Centre of the front edge, field metres: where a heading mark ends. */
  noseM: Point2d;
};

/** Footprint of a robot lengthM long (along its heading) and widthM wide, centred on the pose; sizes must be ≥ 0. */
export function robotFootprint(pose: Pose2d, lengthM: number, widthM: number): Footprint {
  const hl = lengthM / 2;
  const hw = widthM / 2;
  const local: Point2d[] = [
    { xM: hl, yM: hw },
    { xM: -hl, yM: hw },
    { xM: -hl, yM: -hw },
    { xM: hl, yM: -hw },
  ];
  return { corners: local.map((p) => transformPoint(pose, p)), noseM: transformPoint(pose, { xM: hl, yM: 0 }) };
}
