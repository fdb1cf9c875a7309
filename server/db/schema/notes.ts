import { doublePrecision, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { roleEnum, users } from './auth';
import { recordings } from './recordings';

/** Timestamped comments on a recording; they go with it when it is deleted. */
export const recordingNotes = pgTable(
  'recording_notes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    recordingId: uuid('recording_id').notNull().references(() => recordings.id, { onDelete: 'cascade' }),
    /** Null once the author's account is removed; the name and role below keep the note readable. */
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    authorName: text('author_name').notNull(),
    /** The author's role when the note was written. */
    authorRole: roleEnum('author_role').notNull(),
    /** Seconds from the recording's start. */
    tS: doublePrecision('t_s').notNull(),
    text: text('text').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('recording_notes_recording_idx').on(t.recordingId, t.tS, t.createdAt)],
);
