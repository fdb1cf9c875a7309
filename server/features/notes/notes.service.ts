import type { CreateNoteBody, Note } from '../../../shared/schemas/note';
import { AppError, notFound } from '../../lib/errors';
import type { Db } from '../../db/client';
import type { Actor } from '../auth/actor';
import { notesStore, type NotesStore, type StoredNote } from './notes.repo';

export interface NotesServiceDeps {
  store: NotesStore;
}

const publicNote = ({ authorId: _authorId, ...note }: StoredNote): Note => note;

export function createNotesService({ store }: NotesServiceDeps) {
  return {
    /** The recording's notes by moment, then by when they were written. */
    async list(actor: Actor, recordingId: string): Promise<Note[]> {
      if (!(await store.findRecording(actor.team.id, recordingId))) throw notFound('That recording');
      return (await store.list(recordingId)).map(publicNote);
    },

    /** Writes a note at a moment within the recording, signed with the actor's name and role. */
    async create(actor: Actor, recordingId: string, body: CreateNoteBody): Promise<Note> {
      return store.transaction(async (repo) => {
        const recording = await repo.findRecording(actor.team.id, recordingId, true);
        if (!recording) throw notFound('That recording');
        const durationS = recording.durationMs / 1000;
        if (body.tS > durationS) {
          const message = `The recording ends at ${durationS.toFixed(2)} s`;
          throw new AppError('validation_failed', 'Some fields need attention', [{ path: 'tS', message }]);
        }
        const note = await repo.insert({
          recordingId,
          authorId: actor.user.id,
          authorName: actor.user.name,
          authorRole: actor.role,
          tS: body.tS,
          text: body.text,
        });
        return publicNote(note);
      });
    },

    /** Deletes a note; only its author or a lead may. */
    async remove(actor: Actor, recordingId: string, noteId: string): Promise<void> {
      await store.transaction(async (repo) => {
        if (!(await repo.findRecording(actor.team.id, recordingId))) throw notFound('That recording');
        const note = await repo.find(recordingId, noteId);
        if (!note) throw notFound('That note');
        if (actor.role !== 'lead' && note.authorId !== actor.user.id) {
          throw new AppError('forbidden', 'Only the note\'s author or a lead may delete it');
        }
        await repo.remove(recordingId, noteId);
      });
    },
  };
}

export type NotesService = ReturnType<typeof createNotesService>;

/** The service over the database's notes, as the app mounts it. */
export const notesServiceFor = (db: Db): NotesService => createNotesService({ store: notesStore(db) });
