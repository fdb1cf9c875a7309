import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE, scoringDepthM } from '../../shared/domain/robot-profile';
import { PROJECT_ROOT } from '../../server/runtime';
import { addMember, signUpTeam, startTestServer, type TestClient, type TestServer } from '../support/test-server';

let server: TestServer;
let lead: TestClient;
let programmer: TestClient;
let viewer: TestClient;

beforeAll(async () => {
  server = await startTestServer();
  lead = await signUpTeam(server, { email: 'lead@harborlight.example', teamNumber: 19850 });
  programmer = await addMember(server, lead, { email: 'programmer@harborlight.example', role: 'programmer' });
  viewer = await addMember(server, lead, { email: 'viewer@harborlight.example', role: 'viewer' });
});
afterAll(async () => {
  await server.close();
});

const gullwing = {
  ...DEFAULT_ROBOT_PROFILE,
  name: 'Gullwing',
  frameLengthM: 0.8,
  frameWidthM: 0.66,
  scoringSide: 'left' as const,
  standoffM: 0.04,
};

describe('GET /api/season', () => {
  it('serves the 2025 profile with its 22 tags, each value with a source', async () => {
    const res = await viewer.get('/api/season').expect(200);
    expect(res.body.tags).toHaveLength(22);
    // Field size of the welded perimeter, from the 2025 field layout (FACTS.md [FL]).
    expect(res.body.field.lengthM.value).toBe(17.548);
    expect(res.body.field.widthM.value).toBe(8.052);
    for (const tag of res.body.tags) expect(tag.source).toMatch(/\S/);
  });
});

describe('robot profile', () => {
  it('starts from the default profile', async () => {
    const res = await viewer.get('/api/team/robot-profile').expect(200);
    expect(res.body).toMatchObject({ profile: DEFAULT_ROBOT_PROFILE, updatedAt: null });
  });

  it('lets a programmer save it and everyone read it back with the derived depth', async () => {
    const saved = await programmer.put('/api/team/robot-profile').send(gullwing).expect(200);
    expect(saved.body.profile).toEqual(gullwing);
    expect(saved.body.scoringDepthM).toBeCloseTo(0.04 + 0.0762 + 0.33, 6);
    const read = await viewer.get('/api/team/robot-profile').expect(200);
    expect(read.body.profile.name).toBe('Gullwing');
    expect(read.body.updatedByName).toBe('Tomas Reyes');
  });

  it('refuses a viewer with 403 and bad values with 400 field errors, changing nothing', async () => {
    await viewer.put('/api/team/robot-profile').send(gullwing).expect(403);
    const bad = await lead
      .put('/api/team/robot-profile')
      .send({ ...gullwing, frameLengthM: -1, scoringSide: 'top', elevatorHeightsM: { ...gullwing.elevatorHeightsM, L4: 'high' } })
      .expect(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['elevatorHeightsM.L4', 'frameLengthM', 'scoringSide']);
    expect((await viewer.get('/api/team/robot-profile').expect(200)).body.profile).toEqual(gullwing);
  });

  it('is per team', async () => {
    const other = await signUpTeam(server, { email: 'lead@tidewater.example', teamNumber: 19851, teamName: 'Tidewater Works' });
    expect((await other.get('/api/team/robot-profile').expect(200)).body.profile).toEqual(DEFAULT_ROBOT_PROFILE);
  });
});

describe('GET /api/season/targets', () => {
  it('uses the team robot profile by default', async () => {
    const res = await viewer.get('/api/season/targets?alliance=blue').expect(200);
    expect(res.body).toMatchObject({ alliance: 'blue', side: 'left' });
    expect(res.body.depthM).toBeCloseTo(scoringDepthM(gullwing), 9);
    expect(res.body.targets.map((t: { branch: string }) => t.branch).join('')).toBe('ABCDEFGHIJKL');
  });

  it('gives the same numbers as the CLI for the same overrides', async () => {
    const api = await viewer.get('/api/season/targets?alliance=red&depth=0.45&side=left').expect(200);
    const cli = execFileSync(
      process.execPath,
      ['--import', 'tsx', path.join(PROJECT_ROOT, 'server/bin/cli.ts'), 'targets', '--alliance', 'red', '--depth', '0.45', '--side', 'left', '--json'],
      { cwd: PROJECT_ROOT, encoding: 'utf8' },
    );
    expect(JSON.parse(cli)).toEqual(api.body);
  });

  it('answers a bad alliance or depth with 400 naming the field, and 401 when signed out', async () => {
    const res = await viewer.get('/api/season/targets?alliance=green&depth=-2').expect(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['alliance', 'depth']);
    await (await server.client()).get('/api/season/targets?alliance=blue').expect(401);
  });
});
