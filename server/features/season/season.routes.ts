import { Router } from 'express';
import { seasonProfileSchema } from '../../../shared/domain/season/season-profile';
import { branchTargetsSchema } from '../../../shared/domain/season/targets';
import { robotProfileSchema, storedRobotProfileSchema } from '../../../shared/schemas/robot-profile';
import { targetsQuerySchema } from '../../../shared/schemas/season';
import { AppError } from '../../lib/errors';
import { actorOf, requireAction } from '../auth/session.middleware';
import type { TeamService } from '../team/team.service';
import type { SeasonService } from './season.service';

export function seasonRouter({ season, team }: { season: SeasonService; team: TeamService }): Router {
  const router = Router();

  /** For robots (and the simulator): the robot profile of the key's team, with `Authorization: Bearer pwk_…`. */
  router.get('/robot/profile', async (req, res) => {
    const auth = req.get('authorization') ?? '';
    const robot = auth.startsWith('Bearer ') ? await team.authenticateRobot(auth.slice(7).trim()) : undefined;
    if (!robot) throw new AppError('unauthenticated', 'Send a live robot key as Authorization: Bearer pwk_…');
    res.json(storedRobotProfileSchema.parse(await season.robotProfile(robot.teamId)));
  });

  router.get('/season', (_req, res) => {
    res.json(seasonProfileSchema.parse(season.season()));
  });

  router.get('/season/targets', requireAction('team.read'), async (req, res) => {
    const query = targetsQuerySchema.parse(req.query);
    res.json(branchTargetsSchema.parse(await season.targets(actorOf(req).team.id, query)));
  });

  router.get('/team/robot-profile', requireAction('team.read'), async (req, res) => {
    res.json(storedRobotProfileSchema.parse(await season.robotProfile(actorOf(req).team.id)));
  });

  router.put('/team/robot-profile', requireAction('robotProfile.edit'), async (req, res) => {
    const profile = robotProfileSchema.parse(req.body);
    const actor = actorOf(req);
    res.json(storedRobotProfileSchema.parse(await season.saveRobotProfile(actor.team.id, actor.user.id, profile)));
  });

  return router;
}
