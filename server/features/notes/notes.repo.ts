import { and, asc, eq } from 'drizzle-orm';
import type { Role } from '../../../shared/domain/roles';
import type { Note } from '../../../shared/schemas/note';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { recordingNotes, recordings } from '../../db/schema/index';

type NoteRow = typeof recordingNotes.$inferSelect;

export interface NewNote {
  recordingId: string;
  authorId: string;
  authorName: string;
  authorRole: Role;
  tS: number;
  text: string;
}

/** A note as the API gives it, with who may delete it. */
export interface StoredNote extends Note {
  authorId: string | null;
}

function toNote(row: NoteRow): StoredNote {
  return {
    id: row.id,
    recordingId: row.recordingId,
    tS: row.tS,
    text: row.text,
    authorId: row.authorId,
    authorName: row.authorName,
    authorRole: row.authorRole,
    createdAt: row.createdAt.toISOString(),
  };
}

export function notesRepo(db: Executor) {
  return {
    /**
     * The team's recording, or undefined for an unknown id or another team's recording. With `lock`, the
     * recording cannot be deleted until the transaction ends, so a note is never written under a vanishing one.
     */
    async findRecording(teamId: string, recordingId: string, lock = false): Promise<{ durationMs: number } | undefined> {
      const query = db
        .select({ durationMs: recordings.durationMs })
        .from(recordings)
        .where(and(eq(recordings.teamId, teamId), eq(recordings.id, recordingId)));
      const [row] = lock ? await query.for('share') : await query;
      return row;
    },

    async list(recordingId: string): Promise<StoredNote[]> {
      const rows = await db
        .select()
        .from(recordingNotes)
        .where(eq(recordingNotes.recordingId, recordingId))
        .orderBy(asc(recordingNotes.tS), asc(recordingNotes.createdAt), asc(recordingNotes.id));
      return rows.map(toNote);
    },

    async find(recordingId: string, noteId: string): Promise<StoredNote | undefined> {
      const [row] = await db
        .select()
        .from(recordingNotes)
        .where(and(eq(recordingNotes.recordingId, recordingId), eq(recordingNotes.id, noteId)));
      return row ? toNote(row) : undefined;
    },

    async insert(note: NewNote): Promise<StoredNote> {
      const [row] = await db.insert(recordingNotes).values(note).returning();
      return toNote(row!);
    },

    async remove(recordingId: string, noteId: string): Promise<boolean> {
      const rows = await db
        .delete(recordingNotes)
        .where(and(eq(recordingNotes.recordingId, recordingId), eq(recordingNotes.id, noteId)))
        .returning({ id: recordingNotes.id });
      return rows.length > 0;
    },
  };
}
export type NotesRepo = ReturnType<typeof notesRepo>;

export function notesStore(db: Db) {
  return {
    ...notesRepo(db),
    transaction: <T>(fn: (repo: NotesRepo) => Promise<T>): Promise<T> => db.transaction((tx) => fn(notesRepo(tx))),
  };
}
export type NotesStore = ReturnType<typeof notesStore>;
