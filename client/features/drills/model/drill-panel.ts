// Pure: which page of the team's published panel a drill is answered on, and which call part each tap answers.
import { CALL_PART_CHANNELS, CALL_PARTS, type CallPart } from '../../../../shared/domain/drills/drill-calls';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import type { Page, PanelDocument, Tile } from '../../../../shared/schemas/panel';

/** The call part a tile's channel answers (the standard op/ channels), or undefined. */
export function partForChannel(channel: string): CallPart | undefined {
  return CALL_PARTS.find((p) => CALL_PART_CHANNELS[p] === channel);
}

/** The part and value a tap on `tile` answers, or undefined for tiles that answer nothing (pads, readouts …). */
export function tapFromTile(tile: Tile, value: ChannelValue): { part: CallPart; value: string } | undefined {
  if (!('channel' in tile) || typeof value !== 'string') return undefined;
  const part = partForChannel(tile.channel);
  return part ? { part, value } : undefined;
}

/** The call parts a page can answer. */
export function pageParts(page: Page): CallPart[] {
  const parts = new Set(page.tiles.flatMap((t) => ('channel' in t ? [partForChannel(t.channel)] : [])).filter((p): p is CallPart => p !== undefined));
  return CALL_PARTS.filter((p) => parts.has(p));
}

/** The page answering the most call parts (the first such page), or undefined when none answers any. */
export function drillPage(document: PanelDocument): { page: Page; parts: CallPart[] } | undefined {
  let best: { page: Page; parts: CallPart[] } | undefined;
  for (const page of document.pages) {
    const parts = pageParts(page);
    if (parts.length > (best?.parts.length ?? 0)) best = { page, parts };
  }
  return best;
}
