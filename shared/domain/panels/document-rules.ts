// Pure: imports only shared files. The rules of a panel document that its zod schema cannot state: every tile
// lies inside the grid, and tile ids and page ids are unique. The server refuses a document that breaks one
// (400 with these issues); the designer can show the same issues before saving.
import type { FieldIssue } from '../../schemas/error';
import type { PanelDocument } from '../../schemas/panel';

/**
 * The places where `document` breaks a rule, with paths relative to the document (e.g. `pages.0.tiles.3.w`);
 * empty when it keeps them all. Tile ids are unique across the whole document, page ids among the pages.
 */
export function documentRuleIssues(document: PanelDocument): FieldIssue[] {
  const { columns, rows } = document.grid;
  const issues: FieldIssue[] = [];
  const pageIds = new Map<string, string>();
  const tileIds = new Map<string, string>();

  document.pages.forEach((page, pageIndex) => {
    const pagePath = `pages.${pageIndex}`;
    const firstPage = pageIds.get(page.id);
    if (firstPage !== undefined) {
      issues.push({ path: `${pagePath}.id`, message: `Page id "${page.id}" is already used by ${firstPage}` });
    } else {
      pageIds.set(page.id, pagePath);
    }

    page.tiles.forEach((tile, tileIndex) => {
      const tilePath = `${pagePath}.tiles.${tileIndex}`;
      const name = tile.label.trim() === '' ? `Tile "${tile.id}"` : `"${tile.label}"`;
      if (tile.x >= columns) {
        issues.push({ path: `${tilePath}.x`, message: `${name} starts at column ${tile.x}, past the grid's ${columns} columns` });
      } else if (tile.x + tile.w > columns) {
        issues.push({ path: `${tilePath}.w`, message: `${name} runs past the grid's right edge (x ${tile.x} + w ${tile.w} > ${columns} columns)` });
      }
      if (tile.y >= rows) {
        issues.push({ path: `${tilePath}.y`, message: `${name} starts at row ${tile.y}, past the grid's ${rows} rows` });
      } else if (tile.y + tile.h > rows) {
        issues.push({ path: `${tilePath}.h`, message: `${name} runs past the grid's bottom edge (y ${tile.y} + h ${tile.h} > ${rows} rows)` });
      }
      const firstTile = tileIds.get(tile.id);
      if (firstTile !== undefined) {
        issues.push({ path: `${tilePath}.id`, message: `Tile id "${tile.id}" is already used by ${firstTile}` });
      } else {
        tileIds.set(tile.id, tilePath);
      }
    });
  });
  return issues;
}
