import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  foreignKey,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from 'drizzle-orm/pg-core';
import type { PanelDocument } from '../../../shared/schemas/panel';
import { teams, users } from './auth';

/**
 * A team's panel. Deleting sets `deleted_at` (versions stay, so nothing that refers to one breaks).
 * `published_version_id` is the version the driver station runs; the composite key makes sure it is one
 * of this panel's own versions.
 */
export const panels = pgTable(
  'panels',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    publishedVersionId: uuid('published_version_id'),
    deletedAt: timestamp('deleted_at', { withTimezone: true }),
  },
  (t) => [
    unique('panels_team_id_id_key').on(t.teamId, t.id),
    index('panels_team_idx').on(t.teamId, t.createdAt).where(sql`${t.deletedAt} is null`),
    foreignKey({
      name: 'panels_published_version_fk',
      columns: [t.id, t.publishedVersionId],
      foreignColumns: [panelVersions.panelId, panelVersions.id],
    }),
  ],
);

/**
 * Every save of a panel, numbered 1, 2, 3 … per panel. The author's id and name are kept as written (no
 * foreign key), so the history stays whole after an account is removed; the role is read from the
 * membership at the time of asking.
 */
export const panelVersions = pgTable(
  'panel_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    panelId: uuid('panel_id')
      .notNull()
      .references((): AnyPgColumn => panels.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    document: jsonb('document').$type<PanelDocument>().notNull(),
    authorId: uuid('author_id').notNull(),
    authorName: text('author_name').notNull(),
    message: text('message').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    unique('panel_versions_panel_number_key').on(t.panelId, t.number),
    unique('panel_versions_panel_id_id_key').on(t.panelId, t.id),
  ],
);

/** The team's published panel, the one run mode opens: at most one per team, and one of its own. */
export const teamPublishedPanels = pgTable(
  'team_published_panels',
  {
    teamId: uuid('team_id')
      .primaryKey()
      .references(() => teams.id, { onDelete: 'cascade' }),
    panelId: uuid('panel_id').notNull(),
    publishedBy: uuid('published_by').references(() => users.id, { onDelete: 'set null' }),
    publishedAt: timestamp('published_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    foreignKey({
      name: 'team_published_panels_panel_fk',
      columns: [t.teamId, t.panelId],
      foreignColumns: [panels.teamId, panels.id],
    }),
  ],
);
