import { Router } from 'express';
import {
  acceptInviteBodySchema,
  changeRoleBodySchema,
  createdRobotKeySchema,
  createInviteBodySchema,
  createRobotKeyBodySchema,
  idParamsSchema,
  inviteListSchema,
  invitePreviewSchema,
  inviteSchema,
  inviteTokenParamsSchema,
  memberListSchema,
  memberSchema,
  robotKeyListSchema,
  userIdParamsSchema,
} from '../../../shared/schemas/team';
import type { AuthService } from '../auth/auth.service';
import { toMe } from '../auth/auth.routes';
import { actorOf, requireAction, setSessionCookie, type CookiePolicy } from '../auth/session.middleware';
import type { SessionTokens } from '../auth/session-token';
import type { TeamService } from './team.service';

export function teamRouter(deps: {
  team: TeamService;
  auth: AuthService;
  tokens: SessionTokens;
  cookies: CookiePolicy;
}): Router {
  const { team, auth, tokens, cookies } = deps;
  const router = Router();

  router.get('/team/members', requireAction('team.read'), async (req, res) => {
    res.json(memberListSchema.parse({ members: await team.listMembers(actorOf(req)) }));
  });

  router.patch('/team/members/:userId', requireAction('members.manage'), async (req, res) => {
    const { userId } = userIdParamsSchema.parse(req.params);
    const { role } = changeRoleBodySchema.parse(req.body);
    res.json(memberSchema.parse(await team.changeRole(actorOf(req), userId, role)));
  });

  router.delete('/team/members/:userId', requireAction('members.manage'), async (req, res) => {
    const { userId } = userIdParamsSchema.parse(req.params);
    await team.removeMember(actorOf(req), userId);
    res.status(204).end();
  });

  router.get('/team/invites', requireAction('invites.manage'), async (req, res) => {
    res.json(inviteListSchema.parse({ invites: await team.listInvites(actorOf(req)) }));
  });

  router.post('/team/invites', requireAction('invites.manage'), async (req, res) => {
    const body = createInviteBodySchema.parse(req.body);
    res.status(201).json(inviteSchema.parse(await team.createInvite(actorOf(req), body)));
  });

  router.delete('/team/invites/:id', requireAction('invites.manage'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await team.revokeInvite(actorOf(req), id);
    res.status(204).end();
  });

  router.get('/team/robot-keys', requireAction('robotKeys.manage'), async (req, res) => {
    res.json(robotKeyListSchema.parse({ keys: await team.listRobotKeys(actorOf(req)) }));
  });

  router.post('/team/robot-keys', requireAction('robotKeys.manage'), async (req, res) => {
    const { name } = createRobotKeyBodySchema.parse(req.body);
    res.status(201).json(createdRobotKeySchema.parse(await team.createRobotKey(actorOf(req), name)));
  });

  router.delete('/team/robot-keys/:id', requireAction('robotKeys.manage'), async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await team.revokeRobotKey(actorOf(req), id);
    res.status(204).end();
  });

  router.get('/invites/:token', async (req, res) => {
    const { token } = inviteTokenParamsSchema.parse(req.params);
    res.json(invitePreviewSchema.parse(await team.previewInvite(token)));
  });

  router.post('/invites/:token/accept', async (req, res) => {
    const { token } = inviteTokenParamsSchema.parse(req.params);
    const body = acceptInviteBodySchema.parse(req.body);
    const userId = await team.acceptInvite(token, body);
    const actor = await auth.loadActor(userId);
    setSessionCookie(res, await tokens.issue({ userId, sessionVersion: actor.sessionVersion }), cookies);
    res.status(201).json(toMe(actor));
  });

  return router;
}
