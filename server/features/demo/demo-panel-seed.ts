import { DEMO_MATCH_PANEL, DEMO_MATCH_PANEL_NAME, DEMO_PRACTICE_PANEL, DEMO_PRACTICE_PANEL_NAME } from '../../../shared/domain/panels/demo-panel';
import type { PanelDocument, TileKind } from '../../../shared/schemas/panel';
import type { Db } from '../../db/client';
import { authStore } from '../auth/auth.repo';
import { panelsStore, type PanelsRepo } from '../panels/panels.repo';
import { DEMO_MEMBERS, DEMO_TEAM } from './demo-team';

/** The first draft of the match panel, so its history has a step to compare: pickers and the target only. */
const FIRST_DRAFT_KINDS: readonly TileKind[] = ['caption', 'match-clock', 'reef-picker', 'level-picker', 'station-picker', 'target-echo'];

function firstDraft(document: PanelDocument): PanelDocument {
  return { ...document, pages: document.pages.map((page) => ({ ...page, tiles: page.tiles.filter((t) => FIRST_DRAFT_KINDS.includes(t.kind)) })) };
}

interface Author {
  id: string;
  name: string;
}

type SeedVersion = { document: PanelDocument; message: string; createdAt: Date };

async function addPanel(repo: PanelsRepo, teamId: string, author: Author, name: string, versions: SeedVersion[]) {
  const panelId = await repo.insertPanel({ teamId, name, createdBy: author.id, createdAt: versions[0]!.createdAt });
  let versionId = '';
  for (const [index, version] of versions.entries()) {
    versionId = await repo.insertVersion({ panelId, number: index + 1, authorId: author.id, authorName: author.name, ...version });
  }
  return { panelId, latestVersionId: versionId };
}

/**
 * Gives the demo team its panels, written by the demo programmer: "Gullwing match panel" (two versions, the
 * second published and the team's published panel unless the team already has one) and the unpublished
 * draft "Practice layout". A panel already there by name is left alone, so running it again changes nothing.
 */
export async function seedDemoPanels(db: Db, now: () => Date = () => new Date()): Promise<{ created: number }> {
  const auth = authStore(db);
  const team = await auth.findTeamByNumber(DEMO_TEAM.number);
  const programmerEmail = DEMO_MEMBERS.find((m) => m.role === 'programmer')!.email;
  const programmer = await auth.findUserByEmail(programmerEmail);
  if (!team || !programmer) return { created: 0 };
  const author = { id: programmer.id, name: programmer.name };
  // A history that reads like the days before the event: the newest change a day old.
  const hoursAgo = (hours: number) => new Date(now().getTime() - hours * 3_600_000);

  return panelsStore(db).transaction(async (repo) => {
    let created = 0;
    if (!(await repo.findIdByName(team.id, DEMO_MATCH_PANEL_NAME))) {
      const match = await addPanel(repo, team.id, author, DEMO_MATCH_PANEL_NAME, [
        { document: firstDraft(DEMO_MATCH_PANEL), message: 'Reef, level and station pickers with the target echo', createdAt: hoursAgo(72) },
        { document: DEMO_MATCH_PANEL, message: 'Auto routine, algae and endgame pickers, robot lamps and readouts', createdAt: hoursAgo(26) },
      ]);
      await repo.setPublishedVersion(match.panelId, match.latestVersionId);
      if (!(await repo.lockTeamPanel(team.id))) await repo.setTeamPanel(team.id, match.panelId, author.id, now());
      created += 1;
    }
    if (!(await repo.findIdByName(team.id, DEMO_PRACTICE_PANEL_NAME))) {
      await addPanel(repo, team.id, author, DEMO_PRACTICE_PANEL_NAME, [{ document: DEMO_PRACTICE_PANEL, message: 'Practice drives', createdAt: hoursAgo(50) }]);
      created += 1;
    }
    return { created };
  });
}
