import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { Router } from 'express';
import {
  exportQuerySchema,
  recordingDetailSchema,
  recordingEventsSchema,
  recordingListQuerySchema,
  recordingPageSchema,
  recordingParamsSchema,
  recordingPatchSchema,
  recordingSignalsSchema,
  samplesQuerySchema,
  uploadedSchema,
  uploadFieldsSchema,
} from '../../../shared/schemas/recording';
import { setServerTiming } from '../../lib/server-timing';
import { actorOf, requireAction } from '../auth/session.middleware';
import { samplesJson } from './recording-files';
import type { RecordingsService } from './recordings.service';
import { DEFAULT_UPLOAD_LIMIT_BYTES, readUploadForm } from './upload-reader';

export function recordingsRouter(deps: { recordings: RecordingsService; uploadLimitBytes?: number }): Router {
  const { recordings } = deps;
  const limitBytes = deps.uploadLimitBytes ?? DEFAULT_UPLOAD_LIMIT_BYTES;
  const router = Router();

  router.get('/recordings', requireAction('team.read'), async (req, res) => {
    const query = recordingListQuerySchema.parse(req.query);
    res.json(recordingPageSchema.parse(await recordings.list(actorOf(req), query)));
  });

  router.post('/recordings/upload', requireAction('recordings.manage'), async (req, res) => {
    const form = await readUploadForm(req, { limitBytes });
    const { kind } = uploadFieldsSchema.parse(form.fields);
    res.status(201).json(uploadedSchema.parse(await recordings.upload(actorOf(req), form.file, kind)));
  });

  router.get('/recordings/:id', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    res.json(recordingDetailSchema.parse(await recordings.describe(actorOf(req), id)));
  });

  router.patch('/recordings/:id', requireAction('recordings.manage'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    const patch = recordingPatchSchema.parse(req.body);
    res.json(recordingDetailSchema.parse(await recordings.update(actorOf(req), id, patch)));
  });

  router.delete('/recordings/:id', requireAction('recordings.delete'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    await recordings.remove(actorOf(req), id);
    res.status(204).end();
  });

  router.get('/recordings/:id/signals', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    res.json(recordingSignalsSchema.parse({ signals: await recordings.listSignals(actorOf(req).team.id, id) }));
  });

  router.get('/recordings/:id/samples', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    const query = samplesQuerySchema.parse(req.query);
    // The hot path of the replay: the answer is built from typed arrays by the service, so it is written as
    // samplesSchema describes without parsing 2 × 9,000 numbers through zod again (tests check the shape).
    const body = samplesJson(await recordings.samples(actorOf(req), id, query));
    setServerTiming(res);
    res.type('json').send(body);
  });

  router.get('/recordings/:id/events', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    res.json(recordingEventsSchema.parse({ events: await recordings.events(actorOf(req), id) }));
  });

  router.get('/recordings/:id/export', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    const { format } = exportQuerySchema.parse(req.query);
    const download = await recordings.exportFile(actorOf(req), id, format);
    res.attachment(download.fileName).type(download.contentType);
    await pipeline(Readable.from(download.body), res);
  });

  return router;
}
