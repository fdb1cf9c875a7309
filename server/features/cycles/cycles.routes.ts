import { Router } from 'express';
import { cycleReviewSchema, recordingCyclesSchema, reviewQuerySchema } from '../../../shared/schemas/cycle';
import { recordingParamsSchema } from '../../../shared/schemas/recording';
import type { Db } from '../../db/client';
import { setServerTiming } from '../../lib/server-timing';
import { actorOf, requireAction } from '../auth/session.middleware';
import { cyclesServiceFor, type CyclesService } from './cycles.service';

/** The cycles routes; every member reads them (viewers included). `cycles` replaces the service built over `db`. */
export function cyclesRouter(deps: { db: Db; now?: () => Date; cycles?: CyclesService }): Router {
  const cycles = deps.cycles ?? cyclesServiceFor(deps.db, deps.now);
  const router = Router();

  router.get('/recordings/:id/cycles', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    res.json(recordingCyclesSchema.parse(await cycles.forRecording(actorOf(req), id)));
  });

  router.get('/review/cycles', requireAction('team.read'), async (req, res) => {
    const { format, ...filters } = reviewQuerySchema.parse(req.query);
    if (format === 'csv') {
      const csv = await cycles.reviewCsv(actorOf(req), filters);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader('Content-Disposition', 'attachment; filename="pitwall-cycles.csv"');
      setServerTiming(res);
      res.send(csv);
      return;
    }
    const review = cycleReviewSchema.parse(await cycles.review(actorOf(req), filters));
    setServerTiming(res);
    res.json(review);
  });

  return router;
}
