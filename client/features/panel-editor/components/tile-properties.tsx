import { TILE_CATALOGUE } from '../../../../shared/domain/panels/tile-catalogue';
import type { CellRect } from '../../../../shared/domain/panels/layout';
import type { Grid, Theme, Tile } from '../../../../shared/schemas/panel';
import { Button } from '../../../components/ui/button';
import type { EditorAction } from '../model/editor-state';
import { channelSuggestions, checkChannel, checkLabel, checkNumber, checkThresholds, isWritingKind, type Checked } from '../model/property-rules';
import { KindGlyph } from './kind-glyph';
import { IconButton, OptionsEditor } from './options-editor';
import { ChoiceField, ColourSwatches, DraftField } from './property-fields';

type TilePropertiesProps = { tile: Tile; theme: Theme; grid: Grid; canEdit: boolean; dispatch: (a: EditorAction) => void };

const text = (s: string) => s;
const ok = <T,>(value: T): Checked<T> => ({ ok: true, value });

/** The form for one tile: what every tile has (label, place, colours) and what its kind adds. */
export function TileProperties({ tile, theme, grid, canEdit, dispatch }: TilePropertiesProps) {
  const entry = TILE_CATALOGUE[tile.kind];
  const update = (patch: Record<string, unknown>, field: string) => dispatch({ type: 'update-tile', tileId: tile.id, patch, coalesceKey: field });
  const seal = () => dispatch({ type: 'seal' });
  const setRect = (patch: Partial<CellRect>) => dispatch({ type: 'set-tile-rect', tileId: tile.id, rect: { x: tile.x, y: tile.y, w: tile.w, h: tile.h, ...patch } });
  const disabled = !canEdit;

  return (
    <form aria-label={`Properties of the ${entry.label.toLowerCase()}`} className="flex flex-col gap-4" onSubmit={(e) => e.preventDefault()}>
      <div className="flex items-center gap-3">
        <KindGlyph kind={tile.kind} />
        <div className="min-w-0">
          <p className="font-semibold text-asphalt-100">{entry.label}</p>
          <p className="text-sm text-asphalt-400">{entry.description}</p>
        </div>
      </div>

      <DraftField name="label" label="Label" value={tile.label} format={text} check={checkLabel} onCommit={(label) => update({ label }, 'label')} onBlur={seal} isDisabled={disabled} hint="The small heading on the tile." />

      {'channel' in tile && (
        <DraftField
          name="channel"
          label="Channel"
          value={tile.channel}
          format={text}
          check={(t) => checkChannel(t, tile.kind)}
          onCommit={(channel) => update({ channel }, 'channel')}
          onBlur={seal}
          suggestions={channelSuggestions(tile.kind)}
          isMono
          isDisabled={disabled}
          hint={isWritingKind(tile.kind) ? 'What the tile publishes when tapped; the robot code reads it.' : 'What the tile shows, usually a robot/ value.'}
        />
      )}

      {tile.kind === 'reef-picker' && (
        <div className="grid grid-cols-2 gap-3">
          <ChoiceField
            name="labelScheme"
            label="Face names"
            value={tile.labelScheme}
            isDisabled={disabled}
            options={[
              { value: 'letters', label: 'Branch letters A–L' },
              { value: 'compass', label: 'Compass' },
              { value: 'relative', label: 'Near / far' },
              { value: 'clock', label: 'Clock face' },
            ]}
            onChange={(labelScheme) => update({ labelScheme }, 'labelScheme')}
          />
          <ChoiceField
            name="orientation"
            label="Turned to"
            value={tile.orientation}
            isDisabled={disabled}
            options={[
              { value: 'operator', label: 'The operator’s view' },
              { value: 'field', label: 'Field (blue on the left)' },
            ]}
            onChange={(orientation) => update({ orientation }, 'orientation')}
          />
        </div>
      )}

      {(tile.kind === 'level-picker' || tile.kind === 'station-picker' || tile.kind === 'algae-picker' || tile.kind === 'cage-picker' || tile.kind === 'choice-pad') && (
        <OptionsEditor key={tile.id} kind={tile.kind} options={tile.options} onCommit={(options) => update({ options }, 'options')} onBlur={seal} isDisabled={disabled} />
      )}

      {tile.kind === 'readout' && <ReadoutFields tile={tile} update={update} seal={seal} isDisabled={disabled} />}

      {tile.kind === 'lamp' && (
        <>
          <ColourSwatches legend="Light when true" name="onColour" theme={theme} value={tile.onColour} isDisabled={disabled} onChange={(onColour) => update({ onColour }, 'onColour')} />
          <ColourSwatches legend="Light when false" name="offColour" theme={theme} value={tile.offColour} isDisabled={disabled} onChange={(offColour) => update({ offColour }, 'offColour')} />
        </>
      )}

      {tile.kind === 'caption' && (
        <>
          <DraftField
            name="text"
            label="Text"
            value={tile.text}
            format={text}
            check={(t) => (t.length > 200 ? { ok: false, message: 'At most 200 characters' } : ok(t))}
            onCommit={(t) => update({ text: t }, 'text')}
            onBlur={seal}
            isDisabled={disabled}
          />
          <ChoiceField
            name="size"
            label="Text size"
            value={tile.size}
            isDisabled={disabled}
            options={[
              { value: 's', label: 'Small' },
              { value: 'm', label: 'Medium' },
              { value: 'l', label: 'Large' },
            ]}
            onChange={(size) => update({ size }, 'size')}
          />
        </>
      )}

      {tile.kind === 'target-echo' && <EchoChannels channels={tile.channels} onCommit={(channels) => update({ channels }, 'channels')} onBlur={seal} isDisabled={disabled} />}

      <ColourSwatches legend="Fill" name="fill" theme={theme} value={tile.fill} isDisabled={disabled} onChange={(fill) => update({ fill }, 'fill')} />
      <ColourSwatches legend="Text colour" name="ink" theme={theme} value={tile.ink} isDisabled={disabled} onChange={(ink) => update({ ink }, 'ink')} />

      <fieldset disabled={disabled}>
        <legend className="mb-1.5 text-sm font-semibold text-asphalt-200">
          Place <span className="font-normal text-asphalt-400">(cells; smallest {entry.minSize.w} × {entry.minSize.h})</span>
        </legend>
        <div className="grid grid-cols-4 gap-2">
          <DraftField name="x" label="Column" value={tile.x + 1} format={String} check={(t) => checkNumber(t, 'column', { isInteger: true, min: 1, max: grid.columns })} onCommit={(v) => setRect({ x: v - 1 })} isMono inputMode="numeric" />
          <DraftField name="y" label="Row" value={tile.y + 1} format={String} check={(t) => checkNumber(t, 'row', { isInteger: true, min: 1, max: grid.rows })} onCommit={(v) => setRect({ y: v - 1 })} isMono inputMode="numeric" />
          <DraftField name="w" label="Width" value={tile.w} format={String} check={(t) => checkNumber(t, 'width', { isInteger: true, min: entry.minSize.w, max: grid.columns })} onCommit={(v) => setRect({ w: v })} isMono inputMode="numeric" />
          <DraftField name="h" label="Height" value={tile.h} format={String} check={(t) => checkNumber(t, 'height', { isInteger: true, min: entry.minSize.h, max: grid.rows })} onCommit={(v) => setRect({ h: v })} isMono inputMode="numeric" />
        </div>
      </fieldset>
    </form>
  );
}

type ReadoutTile = Extract<Tile, { kind: 'readout' }>;

function ReadoutFields({ tile, update, seal, isDisabled }: { tile: ReadoutTile; update: (patch: Record<string, unknown>, field: string) => void; seal: () => void; isDisabled: boolean }) {
  const t = tile.thresholds;
  const problem = t ? checkThresholds(t) : null;
  return (
    <>
      <div className="grid grid-cols-2 gap-3">
        <DraftField name="unit" label="Unit" value={tile.unit} format={text} check={(u) => (u.length > 12 ? { ok: false, message: 'At most 12 characters' } : ok(u))} onCommit={(unit) => update({ unit }, 'unit')} onBlur={seal} placeholder="V, °C, m/s" isDisabled={isDisabled} />
        <DraftField name="decimals" label="Decimals" value={tile.decimals} format={String} check={(d) => checkNumber(d, 'number of decimals', { isInteger: true, min: 0, max: 4 })} onCommit={(decimals) => update({ decimals }, 'decimals')} onBlur={seal} isMono inputMode="numeric" isDisabled={isDisabled} />
      </div>
      <fieldset disabled={isDisabled} className="flex flex-col gap-2 rounded-lg bg-asphalt-900/60 p-3 ring-1 ring-asphalt-700">
        <legend className="px-1 text-sm font-semibold text-asphalt-200">Thresholds</legend>
        <label className="flex min-h-11 items-center gap-2 text-[0.9375rem] text-asphalt-200">
          <input
            type="checkbox"
            className="size-5 accent-signal-500"
            checked={t !== null}
            onChange={(e) => update({ thresholds: e.target.checked ? { direction: 'below', warn: 11.5, danger: 10.5 } : null }, 'thresholds-on')}
          />
          Turn warn and danger colours past set values
        </label>
        {t && (
          <>
            <ChoiceField
              name="direction"
              label="Bad when the value is"
              value={t.direction}
              options={[
                { value: 'below', label: 'Low (e.g. battery volts)' },
                { value: 'above', label: 'High (e.g. motor temperature)' },
              ]}
              onChange={(direction) => update({ thresholds: { ...t, direction, warn: t.danger, danger: t.warn } }, 'direction')}
            />
            <div className="grid grid-cols-2 gap-3">
              <DraftField name="warn" label="Warn at" unit={tile.unit || undefined} value={t.warn} format={String} check={(v) => checkNumber(v, 'warn value')} onCommit={(warn) => update({ thresholds: { ...t, warn } }, 'warn')} onBlur={seal} isMono inputMode="decimal" />
              <DraftField name="danger" label="Danger at" unit={tile.unit || undefined} value={t.danger} format={String} check={(v) => checkNumber(v, 'danger value')} onCommit={(danger) => update({ thresholds: { ...t, danger } }, 'danger')} onBlur={seal} isMono inputMode="decimal" />
            </div>
            {problem && (
              <p role="alert" className="text-sm font-medium text-stop">
                {problem}
              </p>
            )}
          </>
        )}
      </fieldset>
    </>
  );
}

function EchoChannels({ channels, onCommit, onBlur, isDisabled }: { channels: readonly string[]; onCommit: (c: string[]) => void; onBlur: () => void; isDisabled: boolean }) {
  return (
    <fieldset disabled={isDisabled} className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold text-asphalt-200">Echoed channels</legend>
      <p className="-mt-1 text-sm text-asphalt-400">The selections summed up in large type, in this order.</p>
      {channels.map((c, i) => (
        <div key={`${i}:${channels.length}`} className="flex items-end gap-1">
          <div className="min-w-0 flex-1">
            <DraftField
              name={`echo-${i}`}
              label={`Channel ${i + 1}`}
              value={c}
              format={text}
              check={(t) => checkChannel(t, 'target-echo')}
              onCommit={(v) => onCommit(channels.map((x, j) => (j === i ? v : x)))}
              onBlur={onBlur}
              suggestions={channelSuggestions('level-picker')}
              isMono
            />
          </div>
          <IconButton label={`Remove channel ${i + 1}`} isDisabled={channels.length <= 1} onClick={() => onCommit(channels.filter((_, j) => j !== i))} path="M4 4l8 8M12 4l-8 8" />
        </div>
      ))}
      <Button size="sm" variant="ghost" className="self-start" disabled={channels.length >= 6} onClick={() => onCommit([...channels, 'op/station'])}>
        + Add channel
      </Button>
    </fieldset>
  );
}
