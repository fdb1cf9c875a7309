export type MailSegment = { kind: 'text'; text: string } | { kind: 'link'; href: string };

/**
 * Splits a plain-text mail into text and the links the server found in it, in order, so each link
 * renders as an anchor. Links not present in the text are left to the caller to list separately.
 */
export function splitMailText(text: string, links: readonly string[]): MailSegment[] {
  const ordered = [...new Set(links)].filter(Boolean).sort((a, b) => b.length - a.length);
  const segments: MailSegment[] = [];
  let rest = text;
  while (rest.length > 0) {
    let best: { index: number; href: string } | null = null;
    for (const href of ordered) {
      const index = rest.indexOf(href);
      if (index !== -1 && (best === null || index < best.index)) best = { index, href };
    }
    if (!best) {
      segments.push({ kind: 'text', text: rest });
      break;
    }
    if (best.index > 0) segments.push({ kind: 'text', text: rest.slice(0, best.index) });
    segments.push({ kind: 'link', href: best.href });
    rest = rest.slice(best.index + best.href.length);
  }
  return segments;
}

/** Links that should open inside this Pitwall (same origin) rather than a new tab. */
export function localPath(href: string, origin: string): string | null {
  try {
    const url = new URL(href, origin);
    return url.origin === origin ? url.pathname + url.search + url.hash : null;
  } catch {
    return null;
  }
}
