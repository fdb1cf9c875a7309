import { z } from 'zod';
import { roleSchema } from '../domain/roles';

/** A timestamped comment on a recording, shown on the replay timeline. */
export const noteSchema = z.object({
  id: z.string().uuid(),
  recordingId: z.string().uuid(),
  /** Seconds from the recording's start. */
  tS: z.number().nonnegative(),
  text: z.string(),
  authorName: z.string(),
  authorRole: roleSchema,
  createdAt: z.string().datetime({ offset: true }),
});
export type Note = z.infer<typeof noteSchema>;

export const noteListSchema = z.object({ notes: z.array(noteSchema) });

export const createNoteBodySchema = z.object({
  tS: z.number({ message: 'Give the moment in seconds' }).finite().nonnegative('The moment cannot be before the start'),
  text: z.string().trim().min(1, 'Write the note').max(2000, 'Use at most 2000 characters'),
});
export type CreateNoteBody = z.infer<typeof createNoteBodySchema>;

export const noteParamsSchema = z.object({
  id: z.string().uuid({ message: 'Not a recording id' }),
  noteId: z.string().uuid({ message: 'Not a note id' }),
});
