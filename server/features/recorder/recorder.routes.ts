import { Router } from 'express';
import { recorderCommandSchema, recorderRobotSchema, recorderStatusSchema, recorderStoppedSchema } from '../../../shared/schemas/recorder';
import { AppError } from '../../lib/errors';
import { actorOf, requireAction } from '../auth/session.middleware';
import type { Recorder } from './recorder.service';

/** Recording by hand: which robots are connected and recording, start and stop. */
export function recorderRouter(deps: { recorder: Pick<Recorder, 'status' | 'startRecording' | 'stopRecording'> }): Router {
  const { recorder } = deps;
  const router = Router();

  router.get('/recorder', requireAction('team.read'), (req, res) => {
    res.json(recorderStatusSchema.parse({ robots: recorder.status(actorOf(req).team.id) }));
  });

  router.post('/recorder/start', requireAction('recordings.manage'), (req, res) => {
    const { robot } = recorderCommandSchema.parse(req.body);
    const teamId = actorOf(req).team.id;
    if (recorder.startRecording(teamId, robot) === undefined) throw notConnected(robot);
    const status = recorder.status(teamId).find((r) => r.robot === robot);
    if (!status) throw notConnected(robot);
    res.json(recorderRobotSchema.parse(status));
  });

  router.post('/recorder/stop', requireAction('recordings.manage'), async (req, res) => {
    const { robot } = recorderCommandSchema.parse(req.body);
    const teamId = actorOf(req).team.id;
    const status = recorder.status(teamId).find((r) => r.robot === robot);
    if (!status) throw notConnected(robot);
    if (!status.recording) throw new AppError('conflict', `${robot} is not recording`);
    res.json(recorderStoppedSchema.parse({ recordingId: (await recorder.stopRecording(teamId, robot)) ?? null }));
  });

  return router;
}

const notConnected = (robot: string) => new AppError('not_found', `No robot called ${robot} is connected`);
