import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_MATCH_PANEL, DEMO_MATCH_PANEL_NAME, DEMO_PRACTICE_PANEL, DEMO_PRACTICE_PANEL_NAME } from '../../shared/domain/panels/demo-panel';
import { starterPanelDocument, presetDevice } from '../../shared/domain/panels/starter-panel';
import { ROLES, type Role } from '../../shared/domain/roles';
import { apiErrorBodySchema } from '../../shared/schemas/error';
import {
  panelConflictSchema,
  panelFileSchema,
  panelListSchema,
  panelSchema,
  panelSummarySchema,
  panelVersionListSchema,
  panelVersionSchema,
  publishedPanelSchema,
  type Panel,
  type PanelDocument,
  type Tile,
} from '../../shared/schemas/panel';
import { seedDemo } from '../../server/features/demo/seed';
import { addMember, signUpTeam, startTestServer, type TestClient, type TestServer } from '../support/test-server';

let server: TestServer;
let other: TestClient;
const clients = {} as Record<Role, TestClient>;
const NAMES: Record<Role, string> = {
  lead: 'Rowan Vale',
  programmer: 'Priya Dunmore',
  operator: 'Tomas Reyes',
  coach: 'Hana Whitcombe',
  viewer: 'Eli Marsh',
};
const UNKNOWN = '00000000-0000-4000-8000-000000000000';

async function counts(): Promise<{ panels: number; versions: number; teamPanels: number }> {
  const r = await server.db.db.execute<{ panels: number; versions: number; team_panels: number }>(sql`
    select (select count(*)::int from panels) as panels,
           (select count(*)::int from panel_versions) as versions,
           (select count(*)::int from team_published_panels) as team_panels`);
  const row = r.rows[0]!;
  return { panels: row.panels, versions: row.versions, teamPanels: row.team_panels };
}

const copy = <T>(value: T): T => structuredClone(value);

/** The demo match panel with one tile changed, so saves differ from each other. */
function documentLabelled(label: string): PanelDocument {
  const doc = copy(DEMO_MATCH_PANEL);
  doc.pages[0]!.tiles[0]!.label = label;
  return doc;
}

async function createPanel(client: TestClient, name: string, document: PanelDocument = DEMO_MATCH_PANEL): Promise<Panel> {
  const res = await client.post('/api/panels').send({ name, document }).expect(201);
  return panelSchema.parse(res.body);
}

async function latestVersionId(panelId: string): Promise<string> {
  const res = await clients.lead.get(`/api/panels/${panelId}`).expect(200);
  return panelSchema.parse(res.body).latestVersion.id;
}

let main: Panel;

beforeAll(async () => {
  server = await startTestServer();
  clients.lead = await signUpTeam(server, { email: 'lead@harborlight.example', teamNumber: 19850, name: NAMES.lead });
  for (const role of ROLES.filter((r) => r !== 'lead')) {
    clients[role] = await addMember(server, clients.lead, { email: `${role}@harborlight.example`, role, name: NAMES[role] });
  }
  other = await signUpTeam(server, { email: 'lead@otherharbor.example', teamNumber: 91850, teamName: 'Other Harbor' });
  main = await createPanel(clients.programmer, 'Match panel');
  await clients.programmer.post(`/api/panels/${main.id}/publish`).send({ versionId: main.latestVersion.id }).expect(200);
}, 60_000);
afterAll(async () => {
  await server?.close();
});

describe('creating and reading panels', () => {
  it('starts a panel without a document on the starter document of the default tablet, as version 1', async () => {
    const res = await clients.lead.post('/api/panels').send({ name: '  Fresh panel  ' }).expect(201);
    const panel = panelSchema.parse(res.body);
    expect(panel).toMatchObject({
      name: 'Fresh panel',
      device: { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' },
      latestVersion: { number: 1, author: { name: NAMES.lead, role: 'lead' }, message: 'New panel' },
      publishedVersion: null,
      isTeamPanel: false,
      tileCount: 0,
    });
    expect(panel.document).toEqual(starterPanelDocument());
  });

  it('starts a panel on the starter document of the chosen device', async () => {
    const device = presetDevice('tablet-1920x1200', 'portrait');
    const res = await clients.programmer.post('/api/panels').send({ name: 'Tall one', device }).expect(201);
    expect(panelSchema.parse(res.body).document).toEqual(starterPanelDocument(device));
  });

  it('stores a given document and gives it back, with the tile count and device in the list', async () => {
    const panel = await createPanel(clients.programmer, 'Practice copy', DEMO_PRACTICE_PANEL);
    expect(panel.document).toEqual(DEMO_PRACTICE_PANEL);
    const got = panelSchema.parse((await clients.viewer.get(`/api/panels/${panel.id}`).expect(200)).body);
    expect(got.document).toEqual(DEMO_PRACTICE_PANEL);
    const list = panelListSchema.parse((await clients.coach.get('/api/panels').expect(200)).body);
    const row = list.panels.find((p) => p.id === panel.id)!;
    expect(row).toMatchObject({ name: 'Practice copy', device: DEMO_PRACTICE_PANEL.device, tileCount: DEMO_PRACTICE_PANEL.pages[0]!.tiles.length });
    expect(row).not.toHaveProperty('document');
    expect(list.panels.filter((p) => p.isTeamPanel).map((p) => p.id)).toEqual([main.id]);
  });

  it.each([
    ['no name', { document: DEMO_MATCH_PANEL }, 'name'],
    ['a blank name', { name: '   ' }, 'name'],
    ['a name over 80 characters', { name: 'x'.repeat(81) }, 'name'],
    ['a tile narrower than a cell', { name: 'Bad', document: { ...copy(DEMO_MATCH_PANEL), pages: [{ ...DEMO_MATCH_PANEL.pages[0]!, tiles: [{ ...DEMO_MATCH_PANEL.pages[0]!.tiles[0]!, w: 0 }] }] } }, 'document.pages.0.tiles.0.w'],
    ['a colour that is not #rrggbb', { name: 'Bad', document: { ...DEMO_MATCH_PANEL, theme: { ...DEMO_MATCH_PANEL.theme, text: 'white' } } }, 'document.theme.text'],
  ])('answers 400 with the issue path for %s and writes nothing', async (_name, body, path) => {
    const before = await counts();
    const res = await clients.lead.post('/api/panels').send(body).expect(400);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('validation_failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect(await counts()).toEqual(before);
  });

  it('refuses tiles outside the grid and repeated ids with their paths, and writes nothing', async () => {
    const doc = copy(DEMO_MATCH_PANEL);
    const tiles = doc.pages[0]!.tiles;
    tiles[3] = { ...tiles[3]!, x: 14, w: 3 }; // 14 + 3 > 16 columns
    tiles[5] = { ...tiles[5]!, id: tiles[0]!.id };
    doc.pages.push({ ...copy(doc.pages[0]!), tiles: [] });
    const before = await counts();
    const res = await clients.lead.post('/api/panels').send({ name: 'Broken', document: doc }).expect(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['document.pages.0.tiles.3.w', 'document.pages.0.tiles.5.id', 'document.pages.1.id']);
    expect(res.body.error.message).toBe('3 tiles or pages break the panel\'s rules');
    expect(await counts()).toEqual(before);
  });

  it('answers 404 for an unknown panel and 400 for an id that is not one', async () => {
    expect((await clients.lead.get(`/api/panels/${UNKNOWN}`).expect(404)).body.error.message).toBe('That panel was not found');
    const res = await clients.lead.get('/api/panels/not-a-panel').expect(400);
    expect(res.body.error.issues[0]).toEqual({ path: 'id', message: 'Not a panel id' });
    expect((await clients.lead.get(`/api/panels/${main.id}/versions/nope`).expect(400)).body.error.issues[0].path).toBe('versionId');
  });
});

describe('versions and saving', () => {
  it('numbers every save, lists the versions newest first and gives each version\'s document', async () => {
    const panel = await createPanel(clients.programmer, 'Versioned', documentLabelled('one'));
    const v2 = await clients.lead
      .put(`/api/panels/${panel.id}`)
      .send({ baseVersionId: panel.latestVersion.id, document: documentLabelled('two'), message: ' Moved the clock ' })
      .expect(200);
    const saved = panelSchema.parse(v2.body);
    expect(saved.latestVersion).toMatchObject({ number: 2, author: { name: NAMES.lead, role: 'lead' }, message: 'Moved the clock' });
    expect(saved.document.pages[0]!.tiles[0]!.label).toBe('two');
    const v3 = panelSchema.parse(
      (await clients.programmer.put(`/api/panels/${panel.id}`).send({ baseVersionId: saved.latestVersion.id, document: documentLabelled('three') }).expect(200)).body,
    );
    expect(v3.latestVersion).toMatchObject({ number: 3, message: '' });

    const list = panelVersionListSchema.parse((await clients.viewer.get(`/api/panels/${panel.id}/versions`).expect(200)).body);
    expect(list.versions.map((v) => [v.number, v.author.name])).toEqual([
      [3, NAMES.programmer],
      [2, NAMES.lead],
      [1, NAMES.programmer],
    ]);
    expect(list.versions[0]).not.toHaveProperty('document');
    const first = panelVersionSchema.parse((await clients.coach.get(`/api/panels/${panel.id}/versions/${list.versions[2]!.id}`).expect(200)).body);
    expect(first.document).toEqual(documentLabelled('one'));
    // A version of another panel is not one of this panel's.
    await clients.lead.get(`/api/panels/${main.id}/versions/${first.id}`).expect(404);
    await clients.lead.get(`/api/panels/${panel.id}/versions/${UNKNOWN}`).expect(404);
  });

  it('keeps a removed member\'s versions, with their name and no role', async () => {
    const leaving = await addMember(server, clients.lead, { email: 'leaving@harborlight.example', role: 'programmer', name: 'Ada Finch' });
    const panel = await createPanel(leaving, 'Handed over');
    const members = (await clients.lead.get('/api/team/members').expect(200)).body.members as { userId: string; email: string }[];
    const userId = members.find((m) => m.email === 'leaving@harborlight.example')!.userId;
    await clients.lead.delete(`/api/team/members/${userId}`).expect(204);
    const versions = panelVersionListSchema.parse((await clients.lead.get(`/api/panels/${panel.id}/versions`).expect(200)).body).versions;
    expect(versions).toEqual([expect.objectContaining({ number: 1, author: { id: userId, name: 'Ada Finch', role: null } })]);
    expect(panelSchema.parse((await clients.lead.get(`/api/panels/${panel.id}`).expect(200)).body).document).toEqual(DEMO_MATCH_PANEL);
  });

  it('renames without a new version when only the name changes', async () => {
    const panel = await createPanel(clients.programmer, 'Old name');
    const before = await counts();
    const res = await clients.programmer.put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, name: 'New name' }).expect(200);
    expect(panelSchema.parse(res.body)).toMatchObject({ name: 'New name', latestVersion: { id: panel.latestVersion.id, number: 1 } });
    expect(await counts()).toEqual(before);
  });

  it('answers 400 for a save with neither a name nor a document', async () => {
    const res = await clients.lead.put(`/api/panels/${main.id}`).send({ baseVersionId: await latestVersionId(main.id) }).expect(400);
    expect(res.body.error.issues[0].path).toBe('document');
  });

  it('answers 409 with the current version to a save on a stale version, and writes nothing', async () => {
    const panel = await createPanel(clients.programmer, 'Contested', documentLabelled('base'));
    const first = await clients.programmer.put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, document: documentLabelled('mine') }).expect(200);
    const before = await counts();
    const res = await clients.lead.put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, document: documentLabelled('theirs'), name: 'Renamed' }).expect(409);
    expect(apiErrorBodySchema.parse(res.body).error.code).toBe('conflict');
    expect(res.body.error.message).toContain(`saved by ${NAMES.programmer} (version 2)`);
    const { current } = panelConflictSchema.parse(res.body);
    expect(current).toMatchObject({ id: first.body.latestVersion.id, number: 2, author: { name: NAMES.programmer } });
    expect(current.document).toEqual(documentLabelled('mine'));
    expect(await counts()).toEqual(before);
    expect(panelSchema.parse((await clients.lead.get(`/api/panels/${panel.id}`).expect(200)).body).name).toBe('Contested');
  });

  it('lets exactly one of two simultaneous saves on the same version through; the other gets 409', async () => {
    const panel = await createPanel(clients.programmer, 'Race', documentLabelled('base'));
    const save = (client: TestClient, label: string) =>
      client.put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, document: documentLabelled(label) });
    const results = await Promise.all([save(clients.programmer, 'programmer'), save(clients.lead, 'lead')]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const winner = results.find((r) => r.status === 200)!;
    const loser = results.find((r) => r.status === 409)!;
    expect(panelConflictSchema.parse(loser.body).current.id).toBe(winner.body.latestVersion.id);
    const versions = panelVersionListSchema.parse((await clients.lead.get(`/api/panels/${panel.id}/versions`).expect(200)).body).versions;
    expect(versions.map((v) => v.number)).toEqual([2, 1]);
  });

  it('lets one of six simultaneous saves through and numbers the versions without a gap', async () => {
    const panel = await createPanel(clients.programmer, 'Crowd', documentLabelled('base'));
    const results = await Promise.all(
      [0, 1, 2, 3, 4, 5].map((n) =>
        clients[n % 2 === 0 ? 'lead' : 'programmer'].put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, document: documentLabelled(`save ${n}`) }),
      ),
    );
    expect(results.filter((r) => r.status === 200)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(5);
    const versions = panelVersionListSchema.parse((await clients.lead.get(`/api/panels/${panel.id}/versions`).expect(200)).body).versions;
    expect(versions.map((v) => v.number)).toEqual([2, 1]);
  });

  it('refuses a saved document that breaks the grid, naming the tile, and writes nothing', async () => {
    const doc = copy(DEMO_MATCH_PANEL);
    doc.pages[0]!.tiles[2] = { ...doc.pages[0]!.tiles[2]!, y: 9, h: 2 };
    const before = await counts();
    const res = await clients.lead.put(`/api/panels/${main.id}`).send({ baseVersionId: await latestVersionId(main.id), document: doc }).expect(400);
    expect(res.body.error.issues).toEqual([{ path: 'document.pages.0.tiles.2.h', message: '"Target" runs past the grid\'s bottom edge (y 9 + h 2 > 10 rows)' }]);
    expect(await counts()).toEqual(before);
  });

  it('takes a 200-tile panel within the request size limit', async () => {
    const doc = copy(DEMO_MATCH_PANEL);
    doc.grid = { columns: 20, rows: 10, gapPx: 4 };
    const readout = DEMO_MATCH_PANEL.pages[0]!.tiles.find((t) => t.kind === 'readout')!;
    doc.pages[0]!.tiles = Array.from({ length: 200 }, (_, i): Tile => ({ ...readout, id: `readout-${i}`, label: `Readout number ${i}`, x: i % 20, y: Math.floor(i / 20), w: 1, h: 1 }));
    const panel = await createPanel(clients.programmer, 'Two hundred', doc);
    expect(panel.tileCount).toBe(200);
  });

  /** The largest document the schema allows: `pageCount` pages of 200 choice pads with every text at its longest. */
  function largestDocument(pageCount: number): PanelDocument {
    const doc = copy(DEMO_MATCH_PANEL);
    doc.grid = { columns: 48, rows: 48, gapPx: 0 };
    doc.pages = Array.from({ length: pageCount }, (_, p) => ({
      id: `${'p'.repeat(63)}${p}`,
      name: 'N'.repeat(40),
      tiles: Array.from({ length: 200 }, (_, i): Tile => ({
        id: `${p}-${String(i).padStart(3, '0')}`.padEnd(64, 'x'),
        kind: 'choice-pad',
        x: i % 48,
        y: Math.floor(i / 48),
        w: 1,
        h: 1,
        label: 'L'.repeat(80),
        fill: 'surface',
        ink: 'text',
        channel: `op/${'c'.repeat(125)}`,
        options: Array.from({ length: 12 }, (_, k) => ({ label: 'O'.repeat(40), value: String(k).padEnd(64, 'v') })),
      })),
    }));
    return doc;
  }

  it('takes 200 tiles at their longest, past the general 256 kB limit, and the largest document the schema allows', async () => {
    const page = largestDocument(1);
    expect(Buffer.byteLength(JSON.stringify(page))).toBeGreaterThan(256 * 1024);
    expect((await createPanel(clients.programmer, 'Long texts', page)).tileCount).toBe(200);

    const whole = largestDocument(8);
    const file = { format: 'pitwall.panel', version: 1, name: 'Largest', exportedAt: '2025-03-14T15:00:00Z', document: whole };
    expect(Buffer.byteLength(JSON.stringify(file))).toBeGreaterThan(3_000_000);
    const res = await clients.programmer.post('/api/panels/import').send(file).expect(201);
    expect(res.body.tileCount).toBe(1600);
  });

  it('answers 413 to a body over the panels limit and stores nothing', async () => {
    const before = await counts();
    const res = await clients.programmer.post('/api/panels/import').set('Content-Type', 'application/json').send(`{"name":"${'x'.repeat(4 * 1024 * 1024)}"}`).expect(413);
    expect(res.body.error.code).toBe('payload_too_large');
    expect(await counts()).toEqual(before);
  });
});

describe('publishing', () => {
  it('publishes a chosen version and makes the panel the team\'s; run mode loads that version', async () => {
    const panel = await createPanel(clients.programmer, 'Next match', documentLabelled('published one'));
    const v2 = panelSchema.parse(
      (await clients.programmer.put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, document: documentLabelled('draft') }).expect(200)).body,
    );
    const res = await clients.programmer.post(`/api/panels/${panel.id}/publish`).send({ versionId: panel.latestVersion.id }).expect(200);
    const summary = panelSummarySchema.parse(res.body);
    expect(summary).toMatchObject({ isTeamPanel: true, publishedVersion: { id: panel.latestVersion.id, number: 1 }, latestVersion: { id: v2.latestVersion.id } });

    const published = publishedPanelSchema.parse((await clients.operator.get('/api/panels/published').expect(200)).body);
    expect(published).toMatchObject({ panelId: panel.id, name: 'Next match', version: { number: 1, author: { name: NAMES.programmer, role: 'programmer' } } });
    expect(published.version.document).toEqual(documentLabelled('published one'));

    const list = panelListSchema.parse((await clients.lead.get('/api/panels').expect(200)).body);
    expect(list.panels.filter((p) => p.isTeamPanel).map((p) => p.id)).toEqual([panel.id]);
    // The previous team panel keeps its published version but no longer runs at the driver station.
    expect(list.panels.find((p) => p.id === main.id)).toMatchObject({ isTeamPanel: false, publishedVersion: { id: main.latestVersion.id } });
    expect((await counts()).teamPanels).toBe(1); // one row per team that has published; the other team has not

    await clients.lead.post(`/api/panels/${main.id}/publish`).send({ versionId: main.latestVersion.id }).expect(200);
    expect(publishedPanelSchema.parse((await clients.programmer.get('/api/panels/published').expect(200)).body).panelId).toBe(main.id);
  });

  it('refuses to publish a version of another panel, or an unknown one, and changes nothing', async () => {
    const panel = await createPanel(clients.programmer, 'Mixed up');
    const res = await clients.programmer.post(`/api/panels/${panel.id}/publish`).send({ versionId: main.latestVersion.id }).expect(404);
    expect(res.body.error.issues[0].path).toBe('versionId');
    await clients.programmer.post(`/api/panels/${panel.id}/publish`).send({ versionId: UNKNOWN }).expect(404);
    const bad = await clients.programmer.post(`/api/panels/${panel.id}/publish`).send({ versionId: 'v1' }).expect(400);
    expect(bad.body.error.issues[0]).toEqual({ path: 'versionId', message: 'Not a version id' });
    const after = panelSchema.parse((await clients.lead.get(`/api/panels/${panel.id}`).expect(200)).body);
    expect(after).toMatchObject({ publishedVersion: null, isTeamPanel: false });
  });

  it('answers 404 with a clear message when the team has no published panel', async () => {
    const res = await other.get('/api/panels/published').expect(404);
    expect(res.body.error.message).toBe('Your team has no published panel yet. A lead or programmer publishes one from the panel library.');
  });
});

describe('deleting and duplicating', () => {
  it('will not delete the team\'s published panel, and deletes it once another is published', async () => {
    const panel = await createPanel(clients.programmer, 'Short lived');
    await clients.programmer.post(`/api/panels/${panel.id}/publish`).send({ versionId: panel.latestVersion.id }).expect(200);
    const before = await counts();
    const res = await clients.lead.delete(`/api/panels/${panel.id}`).expect(409);
    expect(res.body.error).toMatchObject({ code: 'conflict', message: expect.stringContaining('Publish another panel first') });
    expect(await counts()).toEqual(before);

    await clients.programmer.post(`/api/panels/${main.id}/publish`).send({ versionId: main.latestVersion.id }).expect(200);
    await clients.programmer.delete(`/api/panels/${panel.id}`).expect(204);
    await clients.lead.get(`/api/panels/${panel.id}`).expect(404);
    await clients.lead.get(`/api/panels/${panel.id}/versions`).expect(404);
    await clients.lead.delete(`/api/panels/${panel.id}`).expect(404);
    await clients.lead.post(`/api/panels/${panel.id}/publish`).send({ versionId: panel.latestVersion.id }).expect(404);
    const list = panelListSchema.parse((await clients.lead.get('/api/panels').expect(200)).body);
    expect(list.panels.map((p) => p.id)).not.toContain(panel.id);
  });

  it('never leaves a deleted panel as the team\'s published one when publish and delete race', async () => {
    for (let round = 0; round < 5; round += 1) {
      const panel = await createPanel(clients.programmer, `Race ${round}`);
      const [publish, remove] = await Promise.all([
        clients.programmer.post(`/api/panels/${panel.id}/publish`).send({ versionId: panel.latestVersion.id }),
        clients.lead.delete(`/api/panels/${panel.id}`),
      ]);
      // Either the publish went first (and the delete was refused) or the delete did (and the publish found nothing).
      expect([[200, 409], [404, 204]]).toContainEqual([publish.status, remove.status]);
      const published = publishedPanelSchema.parse((await clients.operator.get('/api/panels/published').expect(200)).body);
      if (remove.status === 204) expect(published.panelId).not.toBe(panel.id);
      else expect(published.panelId).toBe(panel.id);
    }
    await clients.programmer.post(`/api/panels/${main.id}/publish`).send({ versionId: main.latestVersion.id }).expect(200);
  });

  it('duplicates the newest document into a new panel called "<name> (copy)", or the name given', async () => {
    const panel = await createPanel(clients.programmer, 'Original', documentLabelled('old'));
    await clients.programmer.put(`/api/panels/${panel.id}`).send({ baseVersionId: panel.latestVersion.id, document: documentLabelled('newest') }).expect(200);
    const res = await clients.lead.post(`/api/panels/${panel.id}/duplicate`).send({}).expect(201);
    const dup = panelSchema.parse(res.body);
    expect(dup).toMatchObject({ name: 'Original (copy)', isTeamPanel: false, publishedVersion: null, latestVersion: { number: 1, message: 'Copied from "Original" version 2', author: { name: NAMES.lead } } });
    expect(dup.id).not.toBe(panel.id);
    expect(dup.document).toEqual(documentLabelled('newest'));

    const named = panelSchema.parse((await clients.programmer.post(`/api/panels/${panel.id}/duplicate`).send({ name: 'Finals layout' }).expect(201)).body);
    expect(named.name).toBe('Finals layout');
    const bare = await clients.programmer.post(`/api/panels/${panel.id}/duplicate`).expect(201);
    expect(bare.body.name).toBe('Original (copy)');

    const long = await createPanel(clients.programmer, 'L'.repeat(80));
    const longCopy = panelSchema.parse((await clients.programmer.post(`/api/panels/${long.id}/duplicate`).send({}).expect(201)).body);
    expect(longCopy.name).toBe(`${'L'.repeat(73)} (copy)`);
    expect(longCopy.name).toHaveLength(80);
  });
});

describe('export and import', () => {
  it('exports the newest version as an attachment and imports it back to an equal panel', async () => {
    const panel = await createPanel(clients.programmer, 'Round trip: A/B', DEMO_PRACTICE_PANEL);
    const res = await clients.viewer.get(`/api/panels/${panel.id}/export`).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="Round trip- A-B.pitwall-panel.json"');
    const file = panelFileSchema.parse(JSON.parse(res.text));
    expect(file).toMatchObject({ format: 'pitwall.panel', version: 1, name: 'Round trip: A/B' });

    const imported = panelSchema.parse((await clients.lead.post('/api/panels/import').send(file).expect(201)).body);
    expect(imported.id).not.toBe(panel.id);
    expect(imported.name).toBe(panel.name);
    expect(imported.document).toEqual(panel.document);
    expect(imported.latestVersion).toMatchObject({ number: 1, message: `Imported from a file exported ${file.exportedAt}` });
  });

  const goodFile = () => ({ format: 'pitwall.panel', version: 1, name: 'From a file', exportedAt: '2025-03-14T15:00:00.000Z', document: copy(DEMO_MATCH_PANEL) });

  it.each([
    ['an array', () => [goodFile()], 'Not a Pitwall panel file: expected a JSON object with "format": "pitwall.panel"', ''],
    ['another program\'s file', () => ({ ...goodFile(), format: 'some.other.layout' }), 'Not a Pitwall panel file (format must be "pitwall.panel")', 'format'],
    ['a file with no format', () => ({ ...goodFile(), format: undefined }), 'Not a Pitwall panel file (format must be "pitwall.panel")', 'format'],
    ['a newer file version', () => ({ ...goodFile(), version: 2 }), 'Unsupported panel file version (this Pitwall reads version 1)', 'version'],
    [
      'a tile of zero width',
      () => {
        const file = goodFile();
        (file.document.pages[0]!.tiles[3] as { w: number }).w = 0;
        return file;
      },
      expect.stringMatching(/^The panel file has a problem, first at document\.pages\.0\.tiles\.3\.w: /),
      'document.pages.0.tiles.3.w',
    ],
    [
      'a tile of an unknown kind',
      () => {
        const file = goodFile();
        (file.document.pages[0]!.tiles[1] as { kind: string }).kind = 'dial';
        return file;
      },
      expect.stringContaining('document.pages.0.tiles.1.kind'),
      'document.pages.0.tiles.1.kind',
    ],
    [
      'a tile outside the grid',
      () => {
        const file = goodFile();
        file.document.pages[0]!.tiles[3] = { ...file.document.pages[0]!.tiles[3]!, x: 15, w: 2 };
        return file;
      },
      expect.stringContaining('runs past the grid\'s right edge (x 15 + w 2 > 16 columns)'),
      'document.pages.0.tiles.3.w',
    ],
    ['a file without a document', () => ({ ...goodFile(), document: undefined }), expect.stringContaining('first at document'), 'document'],
  ])('refuses %s with a clear message and the issue path, storing nothing', async (_name, body, message, path) => {
    const before = await counts();
    const res = await clients.programmer.post('/api/panels/import').send(body()).expect(400);
    expect(apiErrorBodySchema.parse(res.body).error).toMatchObject({ code: 'validation_failed', message });
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect(await counts()).toEqual(before);
  });

  it('refuses a file that is not JSON at all, storing nothing', async () => {
    const before = await counts();
    const res = await clients.programmer.post('/api/panels/import').set('Content-Type', 'application/json').send('{"format": "pitwall.panel",').expect(400);
    expect(res.body.error).toMatchObject({ code: 'bad_request', message: 'The request body is not valid JSON' });
    expect(await counts()).toEqual(before);
  });
});

describe('roles', () => {
  const EDIT: Role[] = ['lead', 'programmer'];
  const RUN: Role[] = ['lead', 'programmer', 'operator'];
  const ALL: Role[] = [...ROLES];

  type Call = (client: TestClient) => Promise<number>;
  const routes: [string, Role[], Call][] = [
    ['GET /api/panels', ALL, async (c) => (await c.get('/api/panels')).status],
    ['GET /api/panels/:id', ALL, async (c) => (await c.get(`/api/panels/${main.id}`)).status],
    ['GET /api/panels/:id/versions', ALL, async (c) => (await c.get(`/api/panels/${main.id}/versions`)).status],
    ['GET /api/panels/:id/versions/:versionId', ALL, async (c) => (await c.get(`/api/panels/${main.id}/versions/${main.latestVersion.id}`)).status],
    ['GET /api/panels/:id/export', ALL, async (c) => (await c.get(`/api/panels/${main.id}/export`)).status],
    ['GET /api/panels/published', RUN, async (c) => (await c.get('/api/panels/published')).status],
    ['POST /api/panels', EDIT, async (c) => (await c.post('/api/panels').send({ name: 'By role' })).status],
    ['PUT /api/panels/:id', EDIT, async (c) => (await c.put(`/api/panels/${main.id}`).send({ baseVersionId: await latestVersionId(main.id), document: documentLabelled('by role') })).status],
    [
      'DELETE /api/panels/:id',
      EDIT,
      async (c) => {
        const doomed = await createPanel(clients.lead, 'Doomed');
        return (await c.delete(`/api/panels/${doomed.id}`)).status;
      },
    ],
    ['POST /api/panels/:id/duplicate', EDIT, async (c) => (await c.post(`/api/panels/${main.id}/duplicate`).send({})).status],
    ['POST /api/panels/:id/publish', EDIT, async (c) => (await c.post(`/api/panels/${main.id}/publish`).send({ versionId: await latestVersionId(main.id) })).status],
    [
      'POST /api/panels/import',
      EDIT,
      async (c) => (await c.post('/api/panels/import').send({ format: 'pitwall.panel', version: 1, name: 'Imported', exportedAt: '2025-03-14T15:00:00Z', document: DEMO_MATCH_PANEL })).status,
    ],
  ];

  describe.each(routes)('%s', (_route, allowed, call) => {
    it.each(ROLES.map((role) => [role, allowed.includes(role)] as const))('a %s: allowed %s', async (role, isAllowed) => {
      if (isAllowed) {
        expect(await call(clients[role])).toBeLessThan(300);
        return;
      }
      const before = await counts();
      const status = await call(clients[role]);
      expect(status).toBe(403);
      // The DELETE case writes its throwaway panel as the lead before asking.
      const after = await counts();
      if (_route.startsWith('DELETE')) {
        expect(after).toEqual({ ...before, panels: before.panels + 1, versions: before.versions + 1 });
      } else {
        expect(after).toEqual(before);
      }
    });
  });

  it('answers 401 on every route when signed out', async () => {
    const anon = await server.client();
    for (const [route, , call] of routes) {
      expect(await call(anon), route).toBe(401);
    }
  });
});

describe('team isolation', () => {
  it('never shows or changes another team\'s panels (404 on every route)', async () => {
    const before = await counts();
    expect(panelListSchema.parse((await other.get('/api/panels').expect(200)).body).panels).toEqual([]);
    const base = await latestVersionId(main.id);
    await other.get(`/api/panels/${main.id}`).expect(404);
    await other.put(`/api/panels/${main.id}`).send({ baseVersionId: base, document: documentLabelled('theirs') }).expect(404);
    await other.delete(`/api/panels/${main.id}`).expect(404);
    await other.post(`/api/panels/${main.id}/duplicate`).send({}).expect(404);
    await other.get(`/api/panels/${main.id}/versions`).expect(404);
    await other.get(`/api/panels/${main.id}/versions/${base}`).expect(404);
    await other.post(`/api/panels/${main.id}/publish`).send({ versionId: base }).expect(404);
    await other.get(`/api/panels/${main.id}/export`).expect(404);
    await other.get('/api/panels/published').expect(404);
    expect(await counts()).toEqual(before);

    const theirs = await createPanel(other, 'Their panel');
    await clients.lead.get(`/api/panels/${theirs.id}`).expect(404);
    const ours = panelListSchema.parse((await clients.lead.get('/api/panels').expect(200)).body);
    expect(ours.panels.map((p) => p.id)).not.toContain(theirs.id);
    // Publishing their version on our panel is refused too.
    await clients.lead.post(`/api/panels/${main.id}/publish`).send({ versionId: theirs.latestVersion.id }).expect(404);
  });
});

describe('the demo seed', () => {
  let demo: TestServer;
  beforeAll(async () => {
    demo = await startTestServer();
  }, 60_000);
  afterAll(async () => {
    await demo?.close();
  });

  const signIn = async (email: string) => {
    const client = await demo.client();
    await client.post('/api/auth/sign-in').send({ email, password: 'harborlight-demo' }).expect(200);
    return client;
  };

  it('gives the demo team its published match panel and a draft, and changes nothing when run again', async () => {
    await seedDemo(demo.db.db);
    const programmer = await signIn('programmer@harborlight.example');
    const list = panelListSchema.parse((await programmer.get('/api/panels').expect(200)).body);
    const match = list.panels.find((p) => p.name === DEMO_MATCH_PANEL_NAME)!;
    const practice = list.panels.find((p) => p.name === DEMO_PRACTICE_PANEL_NAME)!;
    expect(match).toMatchObject({
      isTeamPanel: true,
      latestVersion: { number: 2, author: { name: 'Priya Dunmore', role: 'programmer' } },
      publishedVersion: { number: 2 },
      device: { widthPx: 1280, heightPx: 800 },
    });
    expect(practice).toMatchObject({ isTeamPanel: false, publishedVersion: null, latestVersion: { number: 1 } });
    // Most recently changed first: the match panel's second version is a day old, the practice layout two.
    expect(list.panels.map((p) => p.name)).toEqual([DEMO_MATCH_PANEL_NAME, DEMO_PRACTICE_PANEL_NAME]);
    expect(match.tileCount).toBe(DEMO_MATCH_PANEL.pages[0]!.tiles.length);
    const history = panelVersionListSchema.parse((await programmer.get(`/api/panels/${match.id}/versions`).expect(200)).body).versions;
    expect(history.map((v) => v.number)).toEqual([2, 1]);
    expect(Date.parse(history[0]!.createdAt)).toBeGreaterThan(Date.parse(history[1]!.createdAt));
    expect(Date.now() - Date.parse(history[0]!.createdAt)).toBeGreaterThan(20 * 3_600_000);

    const operator = await signIn('operator@harborlight.example');
    const published = publishedPanelSchema.parse((await operator.get('/api/panels/published').expect(200)).body);
    expect(published).toMatchObject({ panelId: match.id, name: DEMO_MATCH_PANEL_NAME });
    expect(published.version.document).toEqual(DEMO_MATCH_PANEL);
    const viewer = await signIn('viewer@harborlight.example');
    await viewer.get('/api/panels/published').expect(403);

    const r = await demo.db.db.execute<{ n: number }>(sql`select count(*)::int as n from panel_versions`);
    expect(await seedDemo(demo.db.db)).toEqual({ created: 0 });
    const again = await demo.db.db.execute<{ n: number }>(sql`select count(*)::int as n from panel_versions`);
    expect(again.rows[0]!.n).toBe(r.rows[0]!.n);
    expect(panelListSchema.parse((await programmer.get('/api/panels').expect(200)).body).panels).toHaveLength(2);
  });
});
