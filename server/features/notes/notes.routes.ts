import { Router } from 'express';
import { createNoteBodySchema, noteListSchema, noteParamsSchema, noteSchema } from '../../../shared/schemas/note';
import { actorOf, requireAction } from '../auth/session.middleware';
import type { Db } from '../../db/client';
import { notesServiceFor, type NotesService } from './notes.service';

const recordingParamsSchema = noteParamsSchema.pick({ id: true });

/** The notes routes; `notes` replaces the service built over `db` (tests pass a fake). */
export function notesRouter(deps: { db: Db; notes?: NotesService }): Router {
  const notes = deps.notes ?? notesServiceFor(deps.db);
  const router = Router();

  router.get('/recordings/:id/notes', requireAction('team.read'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    res.json(noteListSchema.parse({ notes: await notes.list(actorOf(req), id) }));
  });

  router.post('/recordings/:id/notes', requireAction('notes.write'), async (req, res) => {
    const { id } = recordingParamsSchema.parse(req.params);
    const body = createNoteBodySchema.parse(req.body);
    res.status(201).json(noteSchema.parse(await notes.create(actorOf(req), id, body)));
  });

  // Any member may ask; the service lets only the note's author or a lead delete it.
  router.delete('/recordings/:id/notes/:noteId', requireAction('team.read'), async (req, res) => {
    const { id, noteId } = noteParamsSchema.parse(req.params);
    await notes.remove(actorOf(req), id, noteId);
    res.status(204).end();
  });

  return router;
}
