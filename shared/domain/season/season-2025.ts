// Pure data: imports only relative shared files. The 2025 reef game as a season profile; every value cites its source.
// Sources: [GM] 2025 FRC Game Manual; [FL] 2025 AprilTag field layout, welded perimeter (also WPILib 2025.3.2);
// [WD] WPILib documentation 2025. "from memory" = recalled, not read while collecting: keep it configurable.
import type { AprilTag, FieldElement, Alliance, SeasonProfile, Source, Sourced } from './season-profile';

const INCH_M = 0.0254;

const FL: Source = { source: '[FL] 2025 field layout, welded perimeter', confidence: 'high', fromMemory: false };
const FL_DERIVED: Source = { source: 'derived from [FL] tag poses', confidence: 'high', fromMemory: false };
const WD_COORDS: Source = { source: '[WD] coordinate system, always blue origin', confidence: 'high', fromMemory: false };
const GM_OVERVIEW: Source = { source: '[GM] 4 Game Overview', confidence: 'high', fromMemory: false };
const GM_TABLE: Source = { source: '[GM] table 6-2, from memory', confidence: 'med', fromMemory: true };
const GM_REEF_MEMORY: Source = { source: '[GM] 5.3 reef drawings, from memory', confidence: 'med', fromMemory: true };
const MEMORY_MED: Source = { source: 'from memory', confidence: 'med', fromMemory: true };
const MEMORY_LOW: Source = { source: 'from memory, not checked against any drawing', confidence: 'low', fromMemory: true };

const cite = <T>(source: Source, value: T): Sourced<T> => ({ ...source, value });

const FIELD_LENGTH_M = 17.548;
const FIELD_WIDTH_M = 8.052;

function tag(
  id: number,
  element: FieldElement,
  alliance: Alliance,
  xM: number,
  yM: number,
  zM: number,
  yawDeg: number,
): Sourced<AprilTag> {
  return cite(FL, { id, element, alliance, xM, yM, zM, yawDeg });
}

// Barge tags 4, 5, 14 and 15 are pitched 30° in [FL]; only their yaw is kept here.
const tags: Sourced<AprilTag>[] = [
  tag(1, 'coral-station', 'red', 16.697198, 0.65532, 1.4859, 126),
  tag(2, 'coral-station', 'red', 16.697198, 7.39648, 1.4859, 234),
  tag(3, 'processor', 'red', 11.56081, 8.05561, 1.30175, 270),
  tag(4, 'barge', 'red', 9.27608, 6.137656, 1.867916, 0),
  tag(5, 'barge', 'red', 9.27608, 1.914906, 1.867916, 0),
  tag(6, 'reef', 'red', 13.474446, 3.306318, 0.308102, 300),
  tag(7, 'reef', 'red', 13.890498, 4.0259, 0.308102, 0),
  tag(8, 'reef', 'red', 13.474446, 4.745482, 0.308102, 60),
  tag(9, 'reef', 'red', 12.643358, 4.745482, 0.308102, 120),
  tag(10, 'reef', 'red', 12.227306, 4.0259, 0.308102, 180),
  tag(11, 'reef', 'red', 12.643358, 3.306318, 0.308102, 240),
  tag(12, 'coral-station', 'blue', 0.851154, 0.65532, 1.4859, 54),
  tag(13, 'coral-station', 'blue', 0.851154, 7.39648, 1.4859, 306),
  tag(14, 'barge', 'blue', 8.272272, 6.137656, 1.867916, 180),
  tag(15, 'barge', 'blue', 8.272272, 1.914906, 1.867916, 180),
  tag(16, 'processor', 'blue', 5.987542, -0.00381, 1.30175, 90),
  tag(17, 'reef', 'blue', 4.073906, 3.306318, 0.308102, 240),
  tag(18, 'reef', 'blue', 3.6576, 4.0259, 0.308102, 180),
  tag(19, 'reef', 'blue', 4.073906, 4.745482, 0.308102, 120),
  tag(20, 'reef', 'blue', 4.90474, 4.745482, 0.308102, 60),
  tag(21, 'reef', 'blue', 5.321046, 4.0259, 0.308102, 0),
  tag(22, 'reef', 'blue', 4.90474, 3.306318, 0.308102, 300),
];

const centreY = FIELD_WIDTH_M / 2;
// Driver stations about 6 ft wide, numbered left to right as the drivers see them (from memory).
const DRIVER_STATION_SPACING_M = 72 * INCH_M;
// Starting line about 1.2 m short of the field centre line (from memory).
const STARTING_LINE_FROM_BLUE_WALL_M = 7.56;
const CAGE_Y_HIGH_M = [7.26, 6.17, 5.08] as const;

export const season2025: SeasonProfile = {
  id: 'frc-2025-reef',
  name: '2025 reef game',
  year: 2025,
  field: {
    lengthM: cite(FL, FIELD_LENGTH_M),
    widthM: cite(FL, FIELD_WIDTH_M),
    perimeter: 'welded',
    coordinates: cite(WD_COORDS, {
      origin: 'blue alliance wall corner with y = 0',
      xAxis: '+x from the blue wall to the red wall',
      yAxis: '+y to the left of a blue driver',
      zAxis: '+z up',
      angles: 'degrees, counter-clockwise from +x seen from above',
    }),
  },
  tags,
  reefs: {
    blue: {
      centre: cite(FL_DERIVED, { xM: 4.489323, yM: 4.0259 }),
      tagIdsCcw: cite(FL_DERIVED, [18, 17, 22, 21, 20, 19]),
      // The x-axis faces (blue 0.831723, red 0.831596); slanted faces 0.8309. [FL] rounds to 0.01 in.
      centreToFaceM: cite(FL_DERIVED, 0.8317),
    },
    red: {
      centre: cite(FL_DERIVED, { xM: 13.058902, yM: 4.0259 }),
      tagIdsCcw: cite(FL_DERIVED, [7, 8, 9, 10, 11, 6]),
      centreToFaceM: cite(FL_DERIVED, 0.8316),
    },
  },
  reef: {
    branchLateralOffsetM: cite(MEMORY_MED, 6.5 * INCH_M),
    branchLetters: cite(
      { source: '[GM] 5.3 figure for the letters; their placement from memory', confidence: 'low', fromMemory: true },
      ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'I', 'J', 'K', 'L'],
    ),
    levels: {
      L1: cite(GM_REEF_MEMORY, { heightM: 18 * INCH_M, kind: 'trough', tiltDeg: null }),
      L2: cite(GM_REEF_MEMORY, { heightM: 31.875 * INCH_M, kind: 'branch', tiltDeg: 35 }),
      L3: cite(GM_REEF_MEMORY, { heightM: 47.625 * INCH_M, kind: 'branch', tiltDeg: 35 }),
      L4: cite(GM_REEF_MEMORY, { heightM: 72 * INCH_M, kind: 'branch', tiltDeg: 90 }),
    },
  },
  coralStations: {
    blue: cite(FL, [
      { name: 'low-y', tagId: 12 },
      { name: 'high-y', tagId: 13 },
    ]),
    red: cite(FL, [
      { name: 'low-y', tagId: 1 },
      { name: 'high-y', tagId: 2 },
    ]),
  },
  processors: { blue: cite(FL, { tagId: 16 }), red: cite(FL, { tagId: 3 }) },
  barge: {
    centreXM: cite(FL_DERIVED, FIELD_LENGTH_M / 2),
    sizeM: cite(MEMORY_LOW, { depthM: 1.0, lengthM: 7.3 }),
    cages: {
      blue: cite(
        MEMORY_LOW,
        CAGE_Y_HIGH_M.map((yM, i) => ({ name: `cage ${i + 1}`, xM: FIELD_LENGTH_M / 2, yM })),
      ),
      red: cite(
        MEMORY_LOW,
        CAGE_Y_HIGH_M.map((yM, i) => ({ name: `cage ${i + 1}`, xM: FIELD_LENGTH_M / 2, yM: FIELD_WIDTH_M - yM })),
      ),
    },
  },
  startingLines: {
    blue: cite(MEMORY_LOW, { xM: STARTING_LINE_FROM_BLUE_WALL_M, yMinM: 0, yMaxM: FIELD_WIDTH_M }),
    red: cite(MEMORY_LOW, { xM: FIELD_LENGTH_M - STARTING_LINE_FROM_BLUE_WALL_M, yMinM: 0, yMaxM: FIELD_WIDTH_M }),
  },
  driverStations: {
    blue: cite(MEMORY_LOW, [
      { station: 1, xM: 0, yM: centreY + DRIVER_STATION_SPACING_M },
      { station: 2, xM: 0, yM: centreY },
      { station: 3, xM: 0, yM: centreY - DRIVER_STATION_SPACING_M },
    ]),
    red: cite(MEMORY_LOW, [
      { station: 1, xM: FIELD_LENGTH_M, yM: centreY - DRIVER_STATION_SPACING_M },
      { station: 2, xM: FIELD_LENGTH_M, yM: centreY },
      { station: 3, xM: FIELD_LENGTH_M, yM: centreY + DRIVER_STATION_SPACING_M },
    ]),
  },
  robotsPerAlliance: cite(GM_OVERVIEW, 3),
  scoring: {
    leave: cite(GM_TABLE, 3),
    coral: {
      L1: cite(GM_TABLE, { autoPoints: 3, teleopPoints: 2 }),
      L2: cite(GM_TABLE, { autoPoints: 4, teleopPoints: 3 }),
      L3: cite(GM_TABLE, { autoPoints: 6, teleopPoints: 4 }),
      L4: cite(GM_TABLE, { autoPoints: 7, teleopPoints: 5 }),
    },
    algae: { processor: cite(GM_TABLE, 6), net: cite(GM_TABLE, 4) },
    barge: { park: cite(GM_TABLE, 2), shallow: cite(GM_TABLE, 6), deep: cite(GM_TABLE, 12) },
  },
  rankingPoints: {
    coral: cite(
      { source: '[GM] 6.5.4, via secondary text', confidence: 'med', fromMemory: false },
      { coralPerLevel: 5, levelsNeeded: 4, levelsNeededWithCoopertition: 3 },
    ),
    coopertition: cite(
      { source: '[GM] 4 Game Overview', confidence: 'high', fromMemory: false },
      { processorAlgaePerAlliance: 2 },
    ),
    auto: cite(MEMORY_MED, { allRobotsLeave: true, minAutoCoral: 1 }),
    barge: cite(MEMORY_MED, { minBargePoints: 14 }),
    win: cite(MEMORY_MED, 3),
    tie: cite(MEMORY_MED, 1),
  },
  phases: {
    autoDurationS: cite(GM_OVERVIEW, 15),
    teleopDurationS: cite(GM_OVERVIEW, 135),
    endgameDurationS: cite(MEMORY_MED, 20),
  },
};
