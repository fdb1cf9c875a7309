import { Router, type ErrorRequestHandler } from 'express';
import { z } from 'zod';
import {
  createPanelBodySchema,
  duplicatePanelBodySchema,
  panelConflictSchema,
  panelFileSchema,
  panelListSchema,
  panelParamsSchema,
  panelSchema,
  panelSummarySchema,
  panelVersionListSchema,
  panelVersionSchema,
  publishedPanelSchema,
  publishPanelBodySchema,
  updatePanelBodySchema,
  type PanelFile,
} from '../../../shared/schemas/panel';
import type { Db } from '../../db/client';
import { AppError, errorBody, zodIssues } from '../../lib/errors';
import { actorOf, requireAction } from '../auth/session.middleware';
import { PanelConflictError, panelsServiceFor, type PanelsService } from './panels.service';

/**
 * The JSON body limit of the panels routes (app.ts mounts a parser with it before the general 256 kB one):
 * the largest document the schema allows (8 pages × 200 tiles, every text at its longest) is about 3.1 MB.
 */
export const PANEL_BODY_LIMIT = '4mb';

const versionParamsSchema = panelParamsSchema.extend({ versionId: z.string().uuid({ message: 'Not a version id' }) });

/**
 * The export file, or a 400 whose message says what is wrong with it: not a Pitwall panel file, a version
 * this Pitwall does not read, or the places (`document.pages.0.tiles.3.w: …`) that do not parse.
 */
function parsePanelFile(body: unknown): PanelFile {
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new AppError('validation_failed', 'Not a Pitwall panel file: expected a JSON object with "format": "pitwall.panel"', [
      { path: '', message: 'Expected a JSON object' },
    ]);
  }
  const parsed = panelFileSchema.safeParse(body);
  if (parsed.success) return parsed.data;
  const issues = zodIssues(parsed.error);
  const headline = issues.find((i) => i.path === 'format') ?? issues.find((i) => i.path === 'version');
  const message = headline
    ? headline.message
    : `The panel file has ${issues.length === 1 ? 'a problem' : `${issues.length} problems`}, first at ${issues[0]!.path || 'the top'}: ${issues[0]!.message}`;
  throw new AppError('validation_failed', message, issues);
}

/** A stale save answers 409 with the newest version beside the usual error body. */
const conflictHandler: ErrorRequestHandler = (err, _req, res, next) => {
  if (!(err instanceof PanelConflictError)) return next(err);
  const { current } = panelConflictSchema.parse({ current: err.current });
  res.status(409).json({ ...errorBody('conflict', err.message), current });
};

/** The panels routes; `panels` replaces the service built over `db`. */
export function panelsRouter(deps: { db: Db; now: () => Date; panels?: PanelsService }): Router {
  const panels = deps.panels ?? panelsServiceFor(deps.db, deps.now);
  const router = Router();

  router.get('/panels', requireAction('team.read'), async (req, res) => {
    res.json(panelListSchema.parse({ panels: await panels.list(actorOf(req)) }));
  });

  router.post('/panels', requireAction('panels.edit'), async (req, res) => {
    const body = createPanelBodySchema.parse(req.body);
    res.status(201).json(panelSchema.parse(await panels.create(actorOf(req), body)));
  });

  // Before /panels/:id, so these words are never taken for ids.
  router.get('/panels/published', requireAction('panels.run'), async (req, res) => {
    res.json(publishedPanelSchema.parse(await panels.published(actorOf(req))));
  });

  router.post('/panels/import', requireAction('panels.edit'), async (req, res) => {
    const file = parsePanelFile(req.body);
    res.status(201).json(panelSchema.parse(await panels.importFile(actorOf(req), file)));
  });

  router.get('/panels/:id', requireAction('team.read'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    res.json(panelSchema.parse(await panels.get(actorOf(req), id)));
  });

  router.put('/panels/:id', requireAction('panels.edit'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    const body = updatePanelBodySchema.parse(req.body);
    res.json(panelSchema.parse(await panels.update(actorOf(req), id, body)));
  });

  router.delete('/panels/:id', requireAction('panels.edit'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    await panels.remove(actorOf(req), id);
    res.status(204).end();
  });

  router.post('/panels/:id/duplicate', requireAction('panels.edit'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    const body = duplicatePanelBodySchema.parse(req.body ?? {});
    res.status(201).json(panelSchema.parse(await panels.duplicate(actorOf(req), id, body)));
  });

  router.get('/panels/:id/versions', requireAction('team.read'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    res.json(panelVersionListSchema.parse({ versions: await panels.versions(actorOf(req), id) }));
  });

  router.get('/panels/:id/versions/:versionId', requireAction('team.read'), async (req, res) => {
    const { id, versionId } = versionParamsSchema.parse(req.params);
    res.json(panelVersionSchema.parse(await panels.version(actorOf(req), id, versionId)));
  });

  router.post('/panels/:id/publish', requireAction('panels.edit'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    const { versionId } = publishPanelBodySchema.parse(req.body);
    res.json(panelSummarySchema.parse(await panels.publish(actorOf(req), id, versionId)));
  });

  router.get('/panels/:id/export', requireAction('team.read'), async (req, res) => {
    const { id } = panelParamsSchema.parse(req.params);
    const { file, fileName } = await panels.exportFile(actorOf(req), id);
    res.attachment(fileName).json(panelFileSchema.parse(file));
  });

  router.use(conflictHandler);
  return router;
}
