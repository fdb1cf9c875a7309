import { and, desc, eq, isNull, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Role } from '../../../shared/domain/roles';
import type {
  Device,
  Panel,
  PanelDocument,
  PanelSummary,
  PanelVersion,
  PanelVersionSummary,
  PublishedPanel,
} from '../../../shared/schemas/panel';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { memberships, panels, panelVersions, teamPublishedPanels } from '../../db/schema/index';

const latest = alias(panelVersions, 'latest');
const published = alias(panelVersions, 'published');
const latestAuthor = alias(memberships, 'latest_author');
const publishedAuthor = alias(memberships, 'published_author');
const author = alias(memberships, 'author');

type VersionRow = typeof panelVersions.$inferSelect;

function toVersionSummary(row: Omit<VersionRow, 'panelId' | 'document'>, role: Role | null): PanelVersionSummary {
  return {
    id: row.id,
    number: row.number,
    author: { id: row.authorId, name: row.authorName, role },
    createdAt: row.createdAt.toISOString(),
    message: row.message,
  };
}


/** The panel's newest version: the one with the highest number. */
const isLatestOf = (panelId: SQL | typeof panels.id) =>
  sql`${latest.number} = (select max(v.number) from ${panelVersions} v where v.panel_id = ${panelId})`;

export interface NewVersion {
  panelId: string;
  number: number;
  document: PanelDocument;
  authorId: string;
  authorName: string;
  message: string;
  /** Default: the transaction's start (the demo seed backdates its history). */
  createdAt?: Date;
}

/** The panel row as a write sees it after locking it. */
export interface LockedPanel {
  id: string;
  name: string;
  publishedVersionId: string | null;
}

export function panelsRepo(db: Executor) {
  /** Summaries of the team's panels that match `where`; device and tile count are read inside the database. */
  async function summaries(teamId: string, where: SQL | undefined): Promise<PanelSummary[]> {
    const rows = await db
      .select({
        id: panels.id,
        name: panels.name,
        createdAt: panels.createdAt,
        latest: {
          id: latest.id,
          number: latest.number,
          authorId: latest.authorId,
          authorName: latest.authorName,
          message: latest.message,
          createdAt: latest.createdAt,
        },
        device: sql<Device>`${latest.document} -> 'device'`,
        tileCount: sql<number>`(select coalesce(sum(jsonb_array_length(page -> 'tiles')), 0)::int from jsonb_array_elements(${latest.document} -> 'pages') page)`,
        latestRole: latestAuthor.role,
        published: {
          id: published.id,
          number: published.number,
          authorId: published.authorId,
          authorName: published.authorName,
          message: published.message,
          createdAt: published.createdAt,
        },
        publishedRole: publishedAuthor.role,
        isTeamPanel: sql<boolean>`${teamPublishedPanels.panelId} is not null`,
      })
      .from(panels)
      .innerJoin(latest, and(eq(latest.panelId, panels.id), isLatestOf(panels.id)))
      .leftJoin(latestAuthor, and(eq(latestAuthor.teamId, panels.teamId), eq(latestAuthor.userId, latest.authorId)))
      .leftJoin(published, eq(published.id, panels.publishedVersionId))
      .leftJoin(publishedAuthor, and(eq(publishedAuthor.teamId, panels.teamId), eq(publishedAuthor.userId, published.authorId)))
      .leftJoin(teamPublishedPanels, and(eq(teamPublishedPanels.teamId, panels.teamId), eq(teamPublishedPanels.panelId, panels.id)))
      .where(and(eq(panels.teamId, teamId), isNull(panels.deletedAt), where))
      .orderBy(desc(latest.createdAt), desc(panels.createdAt), panels.id);
    return rows.map((row) => ({
      id: row.id,
      name: row.name,
      device: row.device,
      latestVersion: toVersionSummary(row.latest, row.latestRole),
      publishedVersion: row.published ? toVersionSummary(row.published, row.publishedRole) : null,
      isTeamPanel: row.isTeamPanel,
      tileCount: row.tileCount,
      createdAt: row.createdAt.toISOString(),
    }));
  }

  async function versions(teamId: string, panelId: string, where: SQL | undefined): Promise<PanelVersion[]> {
    const rows = await db
      .select({ version: panelVersions, role: author.role })
      .from(panelVersions)
      .innerJoin(panels, eq(panels.id, panelVersions.panelId))
      .leftJoin(author, and(eq(author.teamId, panels.teamId), eq(author.userId, panelVersions.authorId)))
      .where(and(eq(panels.teamId, teamId), eq(panels.id, panelId), isNull(panels.deletedAt), where))
      .orderBy(desc(panelVersions.number));
    return rows.map(({ version, role }) => ({ ...toVersionSummary(version, role), document: version.document }));
  }

  return {
    /** The team's panels, most recently changed first. */
    async list(teamId: string): Promise<PanelSummary[]> {
      return summaries(teamId, undefined);
    },

    /** One of the team's panels with its newest document, or undefined (unknown, deleted or another team's). */
    async find(teamId: string, panelId: string): Promise<Panel | undefined> {
      const [summary] = await summaries(teamId, eq(panels.id, panelId));
      if (!summary) return undefined;
      const [row] = await db.select({ document: panelVersions.document }).from(panelVersions).where(eq(panelVersions.id, summary.latestVersion.id));
      return { ...summary, document: row!.document };
    },

    /** Locks the team's panel row until the transaction ends, so saves, publishes and deletes take turns. */
    async lock(teamId: string, panelId: string): Promise<LockedPanel | undefined> {
      const [row] = await db
        .select({ id: panels.id, name: panels.name, publishedVersionId: panels.publishedVersionId })
        .from(panels)
        .where(and(eq(panels.teamId, teamId), eq(panels.id, panelId), isNull(panels.deletedAt)))
        .for('update');
      return row;
    },

    /** Every version of the team's panel, newest first, with documents. */
    async versions(teamId: string, panelId: string): Promise<PanelVersion[]> {
      return versions(teamId, panelId, undefined);
    },

    async latestVersion(teamId: string, panelId: string): Promise<PanelVersion | undefined> {
      const [version] = await versions(teamId, panelId, sql`${panelVersions.number} = (select max(v.number) from ${panelVersions} v where v.panel_id = ${panelId})`);
      return version;
    },

    async version(teamId: string, panelId: string, versionId: string): Promise<PanelVersion | undefined> {
      const [version] = await versions(teamId, panelId, eq(panelVersions.id, versionId));
      return version;
    },

    /** The team's published panel at its published version, or undefined when there is none. */
    async published(teamId: string): Promise<PublishedPanel | undefined> {
      const [row] = await db
        .select({ panelId: panels.id, name: panels.name, versionId: panels.publishedVersionId })
        .from(teamPublishedPanels)
        .innerJoin(panels, and(eq(panels.teamId, teamPublishedPanels.teamId), eq(panels.id, teamPublishedPanels.panelId)))
        .where(and(eq(teamPublishedPanels.teamId, teamId), isNull(panels.deletedAt)));
      if (!row?.versionId) return undefined;
      const [version] = await versions(teamId, row.panelId, eq(panelVersions.id, row.versionId));
      return version ? { panelId: row.panelId, name: row.name, version } : undefined;
    },

    /** The id of the team's published panel, locked until the transaction ends. */
    async lockTeamPanel(teamId: string): Promise<string | undefined> {
      const [row] = await db
        .select({ panelId: teamPublishedPanels.panelId })
        .from(teamPublishedPanels)
        .where(eq(teamPublishedPanels.teamId, teamId))
        .for('update');
      return row?.panelId;
    },

    /** The id of the team's panel called `name` (not deleted), for the demo seed. */
    async findIdByName(teamId: string, name: string): Promise<string | undefined> {
      const [row] = await db
        .select({ id: panels.id })
        .from(panels)
        .where(and(eq(panels.teamId, teamId), eq(panels.name, name), isNull(panels.deletedAt)))
        .limit(1);
      return row?.id;
    },

    async insertPanel(input: { teamId: string; name: string; createdBy: string; createdAt?: Date }): Promise<string> {
      const [row] = await db.insert(panels).values(input).returning({ id: panels.id });
      return row!.id;
    },

    async insertVersion(input: NewVersion): Promise<string> {
      const [row] = await db.insert(panelVersions).values(input).returning({ id: panelVersions.id });
      return row!.id;
    },

    async rename(panelId: string, name: string): Promise<void> {
      await db.update(panels).set({ name }).where(eq(panels.id, panelId));
    },

    async setPublishedVersion(panelId: string, versionId: string): Promise<void> {
      await db.update(panels).set({ publishedVersionId: versionId }).where(eq(panels.id, panelId));
    },

    /** Makes `panelId` the team's published panel. */
    async setTeamPanel(teamId: string, panelId: string, publishedBy: string, at: Date): Promise<void> {
      await db
        .insert(teamPublishedPanels)
        .values({ teamId, panelId, publishedBy, publishedAt: at })
        .onConflictDoUpdate({ target: teamPublishedPanels.teamId, set: { panelId, publishedBy, publishedAt: at } });
    },

    async markDeleted(panelId: string, at: Date): Promise<void> {
      await db.update(panels).set({ deletedAt: at }).where(eq(panels.id, panelId));
    },
  };
}
export type PanelsRepo = ReturnType<typeof panelsRepo>;

export function panelsStore(db: Db) {
  return {
    ...panelsRepo(db),
    transaction: <T>(fn: (repo: PanelsRepo) => Promise<T>): Promise<T> => db.transaction((tx) => fn(panelsRepo(tx))),
  };
}
export type PanelsStore = ReturnType<typeof panelsStore>;
