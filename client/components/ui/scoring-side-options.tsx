import { SCORING_SIDES, type ScoringSide } from '../../../shared/domain/season/scoring-pose';

export const SCORING_SIDE_LABELS: Record<ScoringSide, string> = { front: 'Front', back: 'Back', left: 'Left', right: 'Right' };

/** The `<option>`s of a scoring-side select. */
export function ScoringSideOptions() {
  return SCORING_SIDES.map((side) => (
    <option key={side} value={side}>
      {SCORING_SIDE_LABELS[side]}
    </option>
  ));
}
