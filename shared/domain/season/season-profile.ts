// Pure: imports only zod. The shape of a season profile: one game's field, elements, scoring and phases as data.
import { z } from 'zod';

export const ALLIANCES = ['blue', 'red'] as const;
export const allianceSchema = z.enum(ALLIANCES);
export type Alliance = z.infer<typeof allianceSchema>;

export const DRIVER_STATIONS = [1, 2, 3] as const;
export const driverStationSchema = z.union([z.literal(1), z.literal(2), z.literal(3)]);
export type DriverStation = z.infer<typeof driverStationSchema>;

export const REEF_LEVELS = ['L1', 'L2', 'L3', 'L4'] as const;
export const reefLevelSchema = z.enum(REEF_LEVELS);
export type ReefLevel = z.infer<typeof reefLevelSchema>;

export const confidenceSchema = z.enum(['high', 'med', 'low']);
export type Confidence = z.infer<typeof confidenceSchema>;

/** Where a value comes from: a citation such as "[FL] …", how sure it is, and whether it was recalled rather than read. */
export const sourceSchema = z.object({
  source: z.string().min(1),
  confidence: confidenceSchema,
  fromMemory: z.boolean(),
});
export type Source = z.infer<typeof sourceSchema>;

/** A value together with its source. */
export type Sourced<T> = Source & { value: T };

/** Schema for a value together with its source. */
export function sourcedSchema<T extends z.ZodType>(value: T) {
  return z.object({ value, source: sourceSchema.shape.source, confidence: confidenceSchema, fromMemory: z.boolean() });
}

const finite = z.number().finite();
const positive = finite.positive();
const pointSchema = z.object({ xM: finite, yM: finite });
const perAlliance = <T extends z.ZodType>(schema: T) => z.object({ blue: schema, red: schema });
const perLevel = <T extends z.ZodType>(schema: T) => z.object({ L1: schema, L2: schema, L3: schema, L4: schema });

export const fieldElementSchema = z.enum(['reef', 'coral-station', 'processor', 'barge']);
export type FieldElement = z.infer<typeof fieldElementSchema>;

/** An AprilTag: position in field metres, yaw = the direction its printed face points (outward normal). */
export const aprilTagSchema = z.object({
  id: z.number().int().positive(),
  xM: finite,
  yM: finite,
  zM: finite,
  yawDeg: finite,
  element: fieldElementSchema,
  /** The alliance the element belongs to; for the shared barge, the alliance whose half the tag faces. */
  alliance: allianceSchema,
});
export type AprilTag = z.infer<typeof aprilTagSchema>;

export const coordinateConventionSchema = z.object({
  origin: z.string(),
  xAxis: z.string(),
  yAxis: z.string(),
  zAxis: z.string(),
  angles: z.string(),
});

export const reefLevelInfoSchema = z.object({
  heightM: positive,
  kind: z.enum(['trough', 'branch']),
  /** Branch tilt from horizontal; null for the trough. */
  tiltDeg: finite.nullable(),
});
export type ReefLevelInfo = z.infer<typeof reefLevelInfoSchema>;

export const reefSchema = z.object({
  centre: sourcedSchema(pointSchema),
  /** Reef tags counter-clockwise seen from above, starting with the face toward the alliance's own wall. */
  tagIdsCcw: sourcedSchema(z.array(z.number().int()).length(6)),
  centreToFaceM: sourcedSchema(positive),
});
export type Reef = z.infer<typeof reefSchema>;

export const reefCommonSchema = z.object({
  /** Branch centre distance either side of the face centre, along the face. */
  branchLateralOffsetM: sourcedSchema(positive),
  /** Twelve letters, two per face in `tagIdsCcw` order; the first of each pair is the clockwise (robot's left) branch. */
  branchLetters: sourcedSchema(z.array(z.string().length(1)).length(12)),
  levels: perLevel(sourcedSchema(reefLevelInfoSchema)),
});

export const coralStationSchema = z.object({ name: z.string(), tagId: z.number().int() });
export const startingLineSchema = z.object({ xM: finite, yMinM: finite, yMaxM: finite });
export const cageSchema = z.object({ name: z.string(), xM: finite, yM: finite });
export const driverStationPositionSchema = z.object({ station: driverStationSchema, xM: finite, yM: finite });

export const seasonProfileSchema = z.object({
  id: z.string(),
  name: z.string(),
  year: z.number().int(),
  field: z.object({
    lengthM: sourcedSchema(positive),
    widthM: sourcedSchema(positive),
    perimeter: z.string(),
    coordinates: sourcedSchema(coordinateConventionSchema),
  }),
  tags: z.array(sourcedSchema(aprilTagSchema)),
  reefs: perAlliance(reefSchema),
  reef: reefCommonSchema,
  coralStations: perAlliance(sourcedSchema(z.array(coralStationSchema))),
  processors: perAlliance(sourcedSchema(z.object({ tagId: z.number().int() }))),
  barge: z.object({
    centreXM: sourcedSchema(finite),
    /** The barge is about this deep (x) and long (y); for drawing only. */
    sizeM: sourcedSchema(z.object({ depthM: positive, lengthM: positive })),
    cages: perAlliance(sourcedSchema(z.array(cageSchema))),
  }),
  startingLines: perAlliance(sourcedSchema(startingLineSchema)),
  driverStations: perAlliance(sourcedSchema(z.array(driverStationPositionSchema).length(3))),
  robotsPerAlliance: sourcedSchema(z.number().int().positive()),
  scoring: z.object({
    leave: sourcedSchema(finite),
    coral: perLevel(sourcedSchema(z.object({ autoPoints: finite, teleopPoints: finite }))),
    algae: z.object({ processor: sourcedSchema(finite), net: sourcedSchema(finite) }),
    barge: z.object({ park: sourcedSchema(finite), shallow: sourcedSchema(finite), deep: sourcedSchema(finite) }),
  }),
  rankingPoints: z.object({
    coral: sourcedSchema(
      z.object({
        coralPerLevel: z.number().int().positive(),
        levelsNeeded: z.number().int().positive(),
        levelsNeededWithCoopertition: z.number().int().positive(),
      }),
    ),
    coopertition: sourcedSchema(z.object({ processorAlgaePerAlliance: z.number().int().positive() })),
    auto: sourcedSchema(z.object({ allRobotsLeave: z.boolean(), minAutoCoral: z.number().int().nonnegative() })),
    barge: sourcedSchema(z.object({ minBargePoints: finite })),
    win: sourcedSchema(finite),
    tie: sourcedSchema(finite),
  }),
  phases: z.object({
    autoDurationS: sourcedSchema(positive),
    teleopDurationS: sourcedSchema(positive),
    /** The endgame is the last part of teleop. */
    endgameDurationS: sourcedSchema(positive),
  }),
});
export type SeasonProfile = z.infer<typeof seasonProfileSchema>;
