// Pure: no imports. WCAG 2.x relative luminance and contrast ratio of two sRGB colours written #rrggbb.
//
// Definitions from WCAG 2.2 ("relative luminance" and "contrast ratio" in the glossary): each 8-bit channel
// c = v / 255 is linearised as c / 12.92 when c ≤ 0.04045, else ((c + 0.055) / 1.055) ^ 2.4; then
// L = 0.2126 R + 0.7152 G + 0.0722 B, and the ratio is (L1 + 0.05) / (L2 + 0.05) with L1 the lighter.

/** The text-contrast minimum of WCAG 2.2 SC 1.4.3 for normal-size text. */
export const TEXT_CONTRAST_MINIMUM = 4.5;

const HEX = /^#([0-9a-fA-F]{2})([0-9a-fA-F]{2})([0-9a-fA-F]{2})$/;

/** The 0–255 channels of a #rrggbb colour; throws on anything else. */
export function parseHexColour(hex: string): { r: number; g: number; b: number } {
  const match = HEX.exec(hex);
  if (!match) throw new Error(`Not a #rrggbb colour: ${JSON.stringify(hex)}`);
  return { r: parseInt(match[1]!, 16), g: parseInt(match[2]!, 16), b: parseInt(match[3]!, 16) };
}

function linearChannel(value255: number): number {
  const c = value255 / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

/** WCAG relative luminance of a #rrggbb colour: 0 for black, 1 for white. */
export function relativeLuminance(hex: string): number {
  const { r, g, b } = parseHexColour(hex);
  return 0.2126 * linearChannel(r) + 0.7152 * linearChannel(g) + 0.0722 * linearChannel(b);
}

/** WCAG contrast ratio of two #rrggbb colours, from 1 (same) to 21 (black and white); order does not matter. */
export function contrastRatio(a: string, b: string): number {
  const la = relativeLuminance(a);
  const lb = relativeLuminance(b);
  const lighter = Math.max(la, lb);
  const darker = Math.min(la, lb);
  return (lighter + 0.05) / (darker + 0.05);
}

/** A ratio as people write it, e.g. "4.48:1" (two decimals, rounded down so a failing ratio never reads as passing). */
export function formatContrastRatio(ratio: number): string {
  return `${(Math.floor(ratio * 100) / 100).toFixed(2)}:1`;
}
