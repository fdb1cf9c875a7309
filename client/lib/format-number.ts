/**
 * A number with a fixed count of decimals, for tables that programmers copy into robot code: ASCII minus,
 * no grouping, and never "-0.000" for a value that rounds to zero.
 */
export function formatFixed(value: number, digits: number): string {
  if (!Number.isFinite(value)) return '—';
  const rounded = roundHalfAway(value, digits);
  return (rounded === 0 ? 0 : rounded).toFixed(digits);
}

/**
 * Rounds on the decimal digits as written, half away from zero: the API's 13.8905 is 13.891, though the
 * nearest double is a hair below and `toFixed` alone would give 13.890.
 */
function roundHalfAway(value: number, digits: number): number {
  const written = String(Math.abs(value));
  if (written.includes('e')) return Number(value.toFixed(digits));
  const scaled = Math.round(Number(`${written}e${digits}`));
  return Math.sign(value) * Number(`${scaled}e-${digits}`);
}

/** Metres to the millimetre. */
export const formatMetres = (valueM: number) => formatFixed(valueM, 3);

/** Degrees to a tenth. */
export const formatDegrees = (valueDeg: number) => formatFixed(valueDeg, 1);

/**
 * Reads a decimal typed by a person: surrounding space is ignored and a decimal comma is accepted.
 * Empty text is `undefined` (the field was left blank), anything else that isn't a number is `NaN`.
 */
export function parseDecimal(text: string): number | undefined {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const normalised = trimmed.replace(',', '.');
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(normalised) ? Number(normalised) : Number.NaN;
}
