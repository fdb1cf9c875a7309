const UNITS: Array<[Intl.RelativeTimeFormatUnit, number]> = [
  ['year', 365 * 24 * 3600_000],
  ['month', 30 * 24 * 3600_000],
  ['week', 7 * 24 * 3600_000],
  ['day', 24 * 3600_000],
  ['hour', 3600_000],
  ['minute', 60_000],
];

const relative = new Intl.RelativeTimeFormat('en', { numeric: 'auto' });

/** "5 minutes ago", "in 7 days", "just now" (within a minute either way). `nowMs` is epoch ms. */
export function formatRelative(iso: string, nowMs: number): string {
  const diffMs = Date.parse(iso) - nowMs;
  if (Number.isNaN(diffMs)) return '—';
  for (const [unit, sizeMs] of UNITS) {
    if (Math.abs(diffMs) >= sizeMs) return relative.format(Math.round(diffMs / sizeMs), unit);
  }
  return 'just now';
}

/** "Mar 14, 2025, 4:05 PM" in the given time zone (the device's when omitted). */
export function formatDateTime(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short', timeZone }).format(date);
}

/** "Mar 14, 2025" in the given time zone (the device's when omitted). */
export function formatDate(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeZone }).format(date);
}
