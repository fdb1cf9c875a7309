import { queryOptions, useQuery } from '@tanstack/react-query';
import { panelSchema, panelVersionSchema, publishedPanelSchema, type PanelDocument } from '../../../../shared/schemas/panel';
import { api } from '../../../lib/api-client';

/** What run mode draws: a panel's document at one version. */
export type RunPanel = {
  panelId: string;
  name: string;
  versionNumber: number;
  /** True when the panel has no published version and run mode shows its latest (programmers testing). */
  isDraft: boolean;
  document: PanelDocument;
};

export const runPanelKeys = {
  published: ['panels', 'published'] as const,
  forPanel: (id: string) => ['panels', id, 'run'] as const,
};

export async function getPublishedRunPanel(): Promise<RunPanel> {
  const p = await api.get('/panels/published', publishedPanelSchema);
  return { panelId: p.panelId, name: p.name, versionNumber: p.version.number, isDraft: false, document: p.version.document };
}

/** A panel's published version, else its latest (a draft). */
export async function getRunPanel(id: string): Promise<RunPanel> {
  const panel = await api.get(`/panels/${id}`, panelSchema);
  const published = panel.publishedVersion;
  if (!published) return { panelId: panel.id, name: panel.name, versionNumber: panel.latestVersion.number, isDraft: true, document: panel.document };
  if (published.id === panel.latestVersion.id) return { panelId: panel.id, name: panel.name, versionNumber: published.number, isDraft: false, document: panel.document };
  const version = await api.get(`/panels/${id}/versions/${published.id}`, panelVersionSchema);
  return { panelId: panel.id, name: panel.name, versionNumber: version.number, isDraft: false, document: version.document };
}

// networkMode 'always': a driver station has no internet, and the browser may call itself offline while the
// service worker still answers from its cache, so the query must not wait for the network to come back.
// Asked again every RECHECK_MS, so a version published meanwhile is offered on the tablet (never swapped in
// by itself: a layout must not change under an operator's finger).
export const RECHECK_MS = 10_000;
export const publishedRunPanelQuery = () =>
  queryOptions({ queryKey: runPanelKeys.published, queryFn: getPublishedRunPanel, networkMode: 'always', refetchOnWindowFocus: false, refetchInterval: RECHECK_MS });
export const runPanelQuery = (id: string) =>
  queryOptions({ queryKey: runPanelKeys.forPanel(id), queryFn: () => getRunPanel(id), networkMode: 'always', refetchOnWindowFocus: false, refetchInterval: RECHECK_MS });

/** Which panel version a RunPanel is, to tell a newer one apart. */
export const runPanelKey = (p: Pick<RunPanel, 'panelId' | 'versionNumber' | 'isDraft'>) => `${p.panelId}:${p.versionNumber}:${p.isDraft ? 'draft' : 'published'}`;

export const usePublishedRunPanel = () => useQuery(publishedRunPanelQuery());
export const useRunPanel = (id: string) => useQuery(runPanelQuery(id));
