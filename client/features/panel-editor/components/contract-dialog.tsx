import { useEffect, useMemo, useState } from 'react';
import { channelContract, contractJava, contractJson, contractPython } from '../../../../shared/domain/panels/contract';
import type { PanelDocument } from '../../../../shared/schemas/panel';
import { CopyButton } from '../../../components/ui/copy-button';
import { cx } from '../../../lib/cx';
import { EditorDialog } from './editor-dialog';

type Tab = 'json' | 'java' | 'python';
const TABS: { id: Tab; label: string; file: (slug: string) => string; mime: string }[] = [
  { id: 'json', label: 'JSON', file: (s) => `${s}.channels.json`, mime: 'application/json' },
  { id: 'java', label: 'Java', file: () => 'PanelChannels.java', mime: 'text/x-java' },
  { id: 'python', label: 'Python', file: () => 'panel_channels.py', mime: 'text/x-python' },
];

type ContractDialogProps = { isOpen: boolean; onClose: () => void; doc: PanelDocument; panelName: string };

/** The channels this panel writes and reads, with types and allowed values, ready to paste into robot code. */
export function ContractDialog({ isOpen, onClose, doc, panelName }: ContractDialogProps) {
  const [tab, setTab] = useState<Tab>('json');
  const contract = useMemo(() => channelContract(doc), [doc]);
  const text = useMemo(() => {
    if (tab === 'json') return contractJson(contract, panelName);
    if (tab === 'java') return contractJava(contract, { panelName });
    return contractPython(contract, { panelName });
  }, [contract, panelName, tab]);
  const current = TABS.find((t) => t.id === tab)!;
  const slug = panelName.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'panel';
  const url = useMemo(() => (isOpen ? URL.createObjectURL(new Blob([text], { type: current.mime })) : null), [isOpen, text, current.mime]);
  useEffect(() => () => (url ? URL.revokeObjectURL(url) : undefined), [url]);

  return (
    <EditorDialog
      isOpen={isOpen}
      onClose={onClose}
      width="xl"
      title="Channel contract"
      description={`${contract.writes.length} channel${contract.writes.length === 1 ? '' : 's'} written by the panel, ${contract.reads.length} read from the robot or the selection. Paste the constants into the robot code so both sides use the same names and values.`}
    >
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div role="tablist" aria-label="Format" className="inline-flex rounded-lg bg-asphalt-900 p-1 ring-1 ring-asphalt-600">
          {TABS.map((t) => (
            <button
              key={t.id}
              type="button"
              role="tab"
              aria-selected={t.id === tab}
              aria-controls="contract-code"
              onClick={() => setTab(t.id)}
              className={cx('min-h-10 rounded-md px-4 text-sm font-semibold', t.id === tab ? 'bg-asphalt-700 text-asphalt-100 ring-1 ring-signal-500/60' : 'text-asphalt-300 hover:text-asphalt-100')}
            >
              {t.label}
            </button>
          ))}
        </div>
        <div className="flex items-center gap-2">
          <CopyButton text={text} label={`Copy ${current.label}`} variant="secondary" />
          {url && (
            <a href={url} download={current.file(slug)} className="inline-flex min-h-11 items-center rounded-lg bg-signal-500 px-3 text-sm font-semibold text-asphalt-950 hover:bg-signal-400">
              Download {current.file(slug)}
            </a>
          )}
        </div>
      </div>
      <pre id="contract-code" role="tabpanel" aria-label={`${current.label} contract`} tabIndex={0} className="num mt-3 max-h-[55dvh] overflow-auto rounded-lg bg-asphalt-950 p-4 text-[0.8125rem] leading-relaxed text-asphalt-200 ring-1 ring-asphalt-700">
        {text}
      </pre>
    </EditorDialog>
  );
}
