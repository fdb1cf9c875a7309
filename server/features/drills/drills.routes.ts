import { Router } from 'express';
import {
  drillBodySchema,
  drillListSchema,
  drillParamsSchema,
  drillResultBodySchema,
  drillResultDetailSchema,
  drillResultListSchema,
  drillResultParamsSchema,
  drillResultQuerySchema,
  drillSchema,
  personalBestListSchema,
  submittedDrillResultSchema,
} from '../../../shared/schemas/drill';
import type { Db } from '../../db/client';
import { actorOf, requireAction } from '../auth/session.middleware';
import { drillsServiceFor, type DrillsService } from './drills.service';

/** The drills routes; `drills` replaces the service built over `db`. */
export function drillsRouter(deps: { db: Db; now?: () => Date; drills?: DrillsService }): Router {
  const drills = deps.drills ?? drillsServiceFor(deps.db, deps.now);
  const router = Router();

  router.get('/drills', requireAction('team.read'), async (req, res) => {
    res.json(drillListSchema.parse({ drills: await drills.list(actorOf(req)) }));
  });

  router.post('/drills', requireAction('drills.send'), async (req, res) => {
    const body = drillBodySchema.parse(req.body);
    res.status(201).json(drillSchema.parse(await drills.create(actorOf(req), body)));
  });

  // Before /drills/:id, so these names are not taken for ids.
  router.get('/drills/results', requireAction('team.read'), async (req, res) => {
    const query = drillResultQuerySchema.parse(req.query);
    res.json(drillResultListSchema.parse({ results: await drills.listResults(actorOf(req), query) }));
  });

  router.post('/drills/results', requireAction('drills.run'), async (req, res) => {
    const body = drillResultBodySchema.parse(req.body);
    res.status(201).json(submittedDrillResultSchema.parse(await drills.submitResult(actorOf(req), body)));
  });

  router.get('/drills/results/:resultId', requireAction('team.read'), async (req, res) => {
    const { resultId } = drillResultParamsSchema.parse(req.params);
    res.json(drillResultDetailSchema.parse(await drills.getResult(actorOf(req), resultId)));
  });

  router.get('/drills/bests', requireAction('team.read'), async (req, res) => {
    const { drillId, operatorId } = drillResultQuerySchema.parse(req.query);
    res.json(personalBestListSchema.parse({ bests: await drills.bests(actorOf(req), { drillId, operatorId }) }));
  });

  router.get('/drills/:id', requireAction('team.read'), async (req, res) => {
    const { id } = drillParamsSchema.parse(req.params);
    res.json(drillSchema.parse(await drills.get(actorOf(req), id)));
  });

  router.put('/drills/:id', requireAction('drills.send'), async (req, res) => {
    const { id } = drillParamsSchema.parse(req.params);
    const body = drillBodySchema.parse(req.body);
    res.json(drillSchema.parse(await drills.update(actorOf(req), id, body)));
  });

  router.delete('/drills/:id', requireAction('drills.send'), async (req, res) => {
    const { id } = drillParamsSchema.parse(req.params);
    await drills.remove(actorOf(req), id);
    res.status(204).end();
  });

  return router;
}
