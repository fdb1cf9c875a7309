// Pure: imports only relative shared files. Names for reef faces in the schemes operators and coaches use.
import { wrapDeg } from '../geometry/pose2d';
import { reefFaces } from './reef-faces';
import { reefViewTransform, viewAngleDeg } from './reef-view';
import type { Alliance, DriverStation, SeasonProfile } from './season-profile';

/** Compass points with the operator at south, in counter-clockwise order from the near face. */
export const COMPASS_LABELS = ['S', 'SE', 'NE', 'N', 'NW', 'SW'] as const;
export type CompassLabel = (typeof COMPASS_LABELS)[number];

/** Plain words for the same six positions, as the operator sees them. */
export const RELATIVE_LABELS = ['near', 'near right', 'far right', 'far', 'far left', 'near left'] as const;
export type RelativeLabel = (typeof RELATIVE_LABELS)[number];

/** Clock hours with the near face at 6 o'clock, in the same order. */
export const CLOCK_HOURS = [6, 4, 2, 12, 10, 8] as const;
export type ClockHour = (typeof CLOCK_HOURS)[number];

export type FaceLabelScheme = 'letters' | 'compass' | 'relative' | 'clock';

export type FaceLabel = {
  faceIndex: number;
  tagId: number;
  /** The face's branch pair, e.g. "A/B". */
  letters: string;
  compass: CompassLabel;
  relative: RelativeLabel;
  clock: ClockHour;
};

/** Labels for the six faces of an alliance's reef as seen from a driver station, in counter-clockwise face order. */
export function faceLabels(season: SeasonProfile, alliance: Alliance, station: DriverStation): FaceLabel[] {
  const view = reefViewTransform(season, alliance, station, 'near-face');
  return reefFaces(season, alliance).map((face) => {
    const fromBottomDeg = wrapDeg(viewAngleDeg(view, face.normalDeg) - 270);
    const slot = (((Math.round(fromBottomDeg / 60) % 6) + 6) % 6) as 0 | 1 | 2 | 3 | 4 | 5;
    return {
      faceIndex: face.faceIndex,
      tagId: face.tagId,
      letters: face.branchLetters.join('/'),
      compass: COMPASS_LABELS[slot],
      relative: RELATIVE_LABELS[slot],
      clock: CLOCK_HOURS[slot],
    };
  });
}

/** One face label as display text in the given scheme, e.g. "A/B", "SE", "near right" or "4 o'clock". */
export function formatFaceLabel(label: FaceLabel, scheme: FaceLabelScheme): string {
  switch (scheme) {
    case 'letters':
      return label.letters;
    case 'compass':
      return label.compass;
    case 'relative':
      return label.relative;
    case 'clock':
      return `${label.clock} o'clock`;
  }
}
