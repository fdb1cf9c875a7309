import { documentRuleIssues } from '../../../shared/domain/panels/document-rules';
import { starterPanelDocument } from '../../../shared/domain/panels/starter-panel';
import {
  PANEL_FORMAT,
  PANEL_FORMAT_VERSION,
  type CreatePanelBody,
  type DuplicatePanelBody,
  type Panel,
  type PanelDocument,
  type PanelFile,
  type PanelSummary,
  type PanelVersion,
  type PanelVersionSummary,
  type PublishedPanel,
  type UpdatePanelBody,
} from '../../../shared/schemas/panel';
import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import type { Actor } from '../auth/actor';
import { panelsStore, type PanelsRepo, type PanelsStore } from './panels.repo';

export interface PanelsServiceDeps {
  store: PanelsStore;
  now: () => Date;
}

const NAME_MAX = 80;
const COPY_SUFFIX = ' (copy)';

/** A save based on a version that is no longer the newest; `current` is the newest, for the 409 body. */
export class PanelConflictError extends AppError {
  constructor(readonly current: PanelVersion) {
    super(
      'conflict',
      `This panel was saved by ${current.author.name} (version ${current.number}) after you opened it. ` +
        'Your changes are not lost: compare them with that version and save again on top of it.',
    );
  }
}

/** Refuses a document that breaks a rule zod cannot state; issue paths start at `prefix`. */
function checkDocument(document: PanelDocument, prefix = 'document'): void {
  const issues = documentRuleIssues(document);
  if (issues.length === 0) return;
  throw new AppError(
    'validation_failed',
    issues.length === 1 ? issues[0]!.message : `${issues.length} tiles or pages break the panel's rules`,
    issues.map((issue) => ({ path: `${prefix}.${issue.path}`, message: issue.message })),
  );
}

/** "<name> (copy)", shortened so it stays within the name limit. */
export function copyName(name: string): string {
  return `${name.slice(0, NAME_MAX - COPY_SUFFIX.length).trimEnd()}${COPY_SUFFIX}`;
}

/** A file name safe in a Content-Disposition header and on any disk: `<name>.pitwall-panel.json`. */
export function exportFileName(name: string): string {
  const safe = name.replace(/[\\/:*?"<>|\u0000-\u001f]+/g, '-').replace(/^[\s-]+|[\s-]+$/g, '') || 'panel';
  return `${safe}.pitwall-panel.json`;
}

const summaryOf = ({ document: _document, ...summary }: Panel): PanelSummary => summary;
const versionSummaryOf = ({ document: _document, ...summary }: PanelVersion): PanelVersionSummary => summary;

export function createPanelsService({ store, now }: PanelsServiceDeps) {
  async function mustFind(repo: PanelsRepo, actor: Actor, panelId: string): Promise<Panel> {
    const panel = await repo.find(actor.team.id, panelId);
    if (!panel) throw notFound('That panel');
    return panel;
  }

  /** A new panel with `document` as version 1, in the open transaction. */
  async function insertNew(repo: PanelsRepo, actor: Actor, name: string, document: PanelDocument, message: string): Promise<Panel> {
    const panelId = await repo.insertPanel({ teamId: actor.team.id, name, createdBy: actor.user.id });
    await repo.insertVersion({ panelId, number: 1, document, authorId: actor.user.id, authorName: actor.user.name, message });
    return mustFind(repo, actor, panelId);
  }

  return {
    /** The team's panels, most recently changed first. */
    async list(actor: Actor): Promise<PanelSummary[]> {
      return store.list(actor.team.id);
    },

    /** A panel with its newest document. */
    async get(actor: Actor, panelId: string): Promise<Panel> {
      return mustFind(store, actor, panelId);
    },

    /** A new panel: the document given, or the starter document for the device (default 1280 × 800). */
    async create(actor: Actor, body: CreatePanelBody): Promise<Panel> {
      const document = body.document ?? starterPanelDocument(body.device);
      checkDocument(document);
      return store.transaction((repo) => insertNew(repo, actor, body.name, document, 'New panel'));
    },

    /**
     * Saves on top of `baseVersionId`, which must still be the newest version (else PanelConflictError). A
     * document becomes the next version; a name renames the panel. A name alone renames without a version.
     */
    async update(actor: Actor, panelId: string, body: UpdatePanelBody): Promise<Panel> {
      if (body.name === undefined && body.document === undefined) {
        throw new AppError('validation_failed', 'Nothing to save: send a new name, a new document or both', [
          { path: 'document', message: 'Send a new name, a new document or both' },
        ]);
      }
      if (body.document) checkDocument(body.document);
      return store.transaction(async (repo) => {
        const panel = await repo.lock(actor.team.id, panelId);
        if (!panel) throw notFound('That panel');
        const latest = await repo.latestVersion(actor.team.id, panelId);
        if (!latest) throw notFound('That panel');
        if (latest.id !== body.baseVersionId) throw new PanelConflictError(latest);
        if (body.document) {
          await repo.insertVersion({
            panelId,
            number: latest.number + 1,
            document: body.document,
            authorId: actor.user.id,
            authorName: actor.user.name,
            message: body.message ?? '',
          });
        }
        if (body.name !== undefined && body.name !== panel.name) await repo.rename(panelId, body.name);
        return mustFind(repo, actor, panelId);
      });
    },

    /** Deletes a panel (its versions are kept out of sight); the team's published panel cannot be. */
    async remove(actor: Actor, panelId: string): Promise<void> {
      await store.transaction(async (repo) => {
        const panel = await repo.lock(actor.team.id, panelId);
        if (!panel) throw notFound('That panel');
        if ((await repo.lockTeamPanel(actor.team.id)) === panelId) {
          throw new AppError(
            'conflict',
            `"${panel.name}" is the team's published panel, which the driver station runs. Publish another panel first, then delete this one.`,
          );
        }
        await repo.markDeleted(panelId, now());
      });
    },

    /** A new panel whose first version is the source's newest document. */
    async duplicate(actor: Actor, panelId: string, body: DuplicatePanelBody): Promise<Panel> {
      return store.transaction(async (repo) => {
        const source = await mustFind(repo, actor, panelId);
        const message = `Copied from "${source.name}" version ${source.latestVersion.number}`;
        return insertNew(repo, actor, body.name ?? copyName(source.name), source.document, message);
      });
    },

    /** The panel's versions, newest first. */
    async versions(actor: Actor, panelId: string): Promise<PanelVersionSummary[]> {
      const versions = await store.versions(actor.team.id, panelId);
      if (versions.length === 0) throw notFound('That panel');
      return versions.map(versionSummaryOf);
    },

    async version(actor: Actor, panelId: string, versionId: string): Promise<PanelVersion> {
      const version = await store.version(actor.team.id, panelId, versionId);
      if (version) return version;
      await mustFind(store, actor, panelId);
      throw notFound('That version');
    },

    /** Publishes one of the panel's versions and makes the panel the team's published panel. */
    async publish(actor: Actor, panelId: string, versionId: string): Promise<PanelSummary> {
      return store.transaction(async (repo) => {
        if (!(await repo.lock(actor.team.id, panelId))) throw notFound('That panel');
        if (!(await repo.version(actor.team.id, panelId, versionId))) {
          throw new AppError('not_found', 'That version is not one of this panel\'s versions', [{ path: 'versionId', message: 'Not a version of this panel' }]);
        }
        await repo.setPublishedVersion(panelId, versionId);
        await repo.setTeamPanel(actor.team.id, panelId, actor.user.id, now());
        return summaryOf(await mustFind(repo, actor, panelId));
      });
    },

    /** What run mode opens: the team's published panel at its published version. */
    async published(actor: Actor): Promise<PublishedPanel> {
      const published = await store.published(actor.team.id);
      if (!published) {
        throw new AppError('not_found', 'Your team has no published panel yet. A lead or programmer publishes one from the panel library.');
      }
      return published;
    },

    /** A new panel from an export file (already parsed with panelFileSchema). */
    async importFile(actor: Actor, file: PanelFile): Promise<Panel> {
      checkDocument(file.document);
      const message = `Imported from a file exported ${file.exportedAt}`;
      return store.transaction((repo) => insertNew(repo, actor, file.name, file.document, message));
    },

    /** The export file of the panel's newest version and the name to save it under. */
    async exportFile(actor: Actor, panelId: string): Promise<{ file: PanelFile; fileName: string }> {
      const panel = await mustFind(store, actor, panelId);
      const file: PanelFile = {
        format: PANEL_FORMAT,
        version: PANEL_FORMAT_VERSION,
        name: panel.name,
        exportedAt: now().toISOString(),
        document: panel.document,
      };
      return { file, fileName: exportFileName(panel.name) };
    },
  };
}

export type PanelsService = ReturnType<typeof createPanelsService>;

/** The service over the database's panels, as the app mounts it. */
export const panelsServiceFor = (db: Db, now: () => Date): PanelsService => createPanelsService({ store: panelsStore(db), now });
