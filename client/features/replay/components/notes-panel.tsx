import { useState, type FormEvent } from 'react';
import { can, type Role } from '../../../../shared/domain/roles';
import { ROLE_LABELS } from '../../../../shared/domain/roles';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-error';
import { useCreateNote, useDeleteNote, useNotes } from '../api/replay';
import { useReplayStore } from '../hooks/use-replay';
import { formatCursor } from '../model/replay-view';

type NotesPanelProps = { recordingId: string; me: { name: string; role: Role } };

/** Timestamped comments: the list (click one to jump), a form that notes the cursor's moment, delete for your own. */
export function NotesPanel({ recordingId, me }: NotesPanelProps) {
  const store = useReplayStore();
  const notes = useNotes(recordingId);
  const create = useCreateNote(recordingId);
  const remove = useDeleteNote(recordingId);
  const [text, setText] = useState('');
  const canWrite = can(me.role, 'notes.write');

  if (notes.isError && notes.error instanceof ApiError && notes.error.status === 404) {
    return <p className="text-sm text-asphalt-400">Notes aren’t available on this server yet. They will appear here once it is updated.</p>;
  }

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const tS = Number(store.get().tS.toFixed(2));
    create.mutate({ tS, text }, { onSuccess: () => setText('') });
  };
  const list = [...(notes.data?.notes ?? [])].sort((a, b) => a.tS - b.tS);

  return (
    <div className="flex flex-col gap-4">
      {canWrite ? (
        <form onSubmit={submit} className="flex flex-col gap-2">
          <label htmlFor="replay-note" className="text-sm font-semibold text-asphalt-200">
            Note at the cursor
          </label>
          <textarea
            id="replay-note"
            value={text}
            onChange={(e) => setText(e.target.value)}
            onKeyDown={(e) => e.stopPropagation()}
            rows={2}
            maxLength={2000}
            placeholder="What happened here?"
            className="rounded-lg bg-asphalt-900 px-3 py-2 text-[0.9375rem] text-asphalt-100 ring-1 ring-asphalt-600 ring-inset placeholder:text-asphalt-500 focus:ring-signal-500"
          />
          {create.isError && <p role="alert" className="text-sm text-stop">{create.error.message}</p>}
          <Button type="submit" size="sm" variant="primary" isPending={create.isPending} disabled={text.trim() === ''} className="self-end">
            Add note
          </Button>
        </form>
      ) : (
        <p className="text-sm text-asphalt-400">Coaches, programmers and leads can add notes; your role can read them.</p>
      )}
      {notes.isPending ? (
        <p className="text-sm text-asphalt-400">Loading notes…</p>
      ) : notes.isError ? (
        <p role="alert" className="text-sm text-stop">Couldn’t load the notes: {notes.error.message}</p>
      ) : list.length === 0 ? (
        <p className="text-sm text-asphalt-400">No notes yet. A note marks the moment on the timeline for everyone.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-asphalt-750" aria-label="Notes">
          {list.map((n) => {
            const canDelete = n.authorName === me.name || me.role === 'lead';
            return (
              <li key={n.id} className="flex items-start gap-3 py-2.5">
                <button
                  type="button"
                  onClick={() => store.seek(n.tS)}
                  className="num shrink-0 rounded bg-signal-950 px-1.5 py-0.5 text-xs text-signal-300 ring-1 ring-signal-600/40 hover:bg-signal-600/30"
                  aria-label={`Jump to ${formatCursor(n.tS).seconds}`}
                >
                  {formatCursor(n.tS).seconds}
                </button>
                <div className="min-w-0 flex-1">
                  <p className="text-[0.9375rem] break-words whitespace-pre-wrap text-asphalt-100">{n.text}</p>
                  <p className="mt-0.5 text-xs text-asphalt-500">
                    {n.authorName} · {ROLE_LABELS[n.authorRole]}
                  </p>
                </div>
                {canDelete && (
                  <Button
                    variant="ghost"
                    size="sm"
                    className="min-h-8 px-2 text-xs"
                    isPending={remove.isPending && remove.variables === n.id}
                    onClick={() => remove.mutate(n.id)}
                    aria-label={`Delete note “${n.text.slice(0, 40)}”`}
                  >
                    Delete
                  </Button>
                )}
              </li>
            );
          })}
        </ul>
      )}
      {remove.isError && <p role="alert" className="text-sm text-stop">Couldn’t delete the note: {remove.error.message}</p>}
    </div>
  );
}
