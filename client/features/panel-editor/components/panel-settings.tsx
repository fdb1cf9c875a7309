import { useState } from 'react';
import { cellSize, deviceSize } from '../../../../shared/domain/panels/grid';
import { DEVICE_PRESETS, type DevicePreset, type PanelDocument } from '../../../../shared/schemas/panel';
import { SegmentedControl } from '../../../components/ui/segmented-control';
import type { EditorAction } from '../model/editor-state';
import { checkNumber } from '../model/property-rules';
import { ChoiceField, DraftField } from './property-fields';

const PRESETS = Object.keys(DEVICE_PRESETS) as DevicePreset[];

/** The target tablet and the grid, shown when no tile is selected. */
export function PanelSettings({ doc, canEdit, dispatch }: { doc: PanelDocument; canEdit: boolean; dispatch: (a: EditorAction) => void }) {
  const { device, grid } = doc;
  const [isCustom, setIsCustom] = useState(device.preset === 'custom');
  const screen = deviceSize(device);
  const cell = cellSize(device, grid);
  return (
    <fieldset disabled={!canEdit} className="flex flex-col gap-4">
      <legend className="mb-1 text-sm font-semibold text-asphalt-100">Tablet and grid</legend>
      <ChoiceField
        name="preset"
        label="Target tablet"
        value={isCustom ? 'custom' : device.preset}
        options={[...PRESETS.map((p) => ({ value: p, label: DEVICE_PRESETS[p].label })), { value: 'custom', label: 'Custom size' }]}
        onChange={(preset) => {
          if (preset === 'custom') {
            setIsCustom(true);
            dispatch({ type: 'set-device', device: { ...device, preset: 'custom' } });
          } else {
            setIsCustom(false);
            const p = DEVICE_PRESETS[preset as DevicePreset];
            dispatch({ type: 'set-device', device: { ...device, preset: preset as DevicePreset, widthPx: p.widthPx, heightPx: p.heightPx } });
          }
        }}
      />
      {isCustom && (
        <div className="grid grid-cols-2 gap-3">
          <DraftField name="deviceWidth" label="Width" unit="px" value={device.widthPx} format={String} check={(t) => checkNumber(t, 'width', { isInteger: true, min: 320, max: 4096 })} onCommit={(widthPx) => dispatch({ type: 'set-device', device: { ...device, widthPx } })} isMono inputMode="numeric" hint="Landscape" />
          <DraftField name="deviceHeight" label="Height" unit="px" value={device.heightPx} format={String} check={(t) => checkNumber(t, 'height', { isInteger: true, min: 240, max: 4096 })} onCommit={(heightPx) => dispatch({ type: 'set-device', device: { ...device, heightPx } })} isMono inputMode="numeric" hint="Landscape" />
        </div>
      )}
      <SegmentedControl
        legend="Orientation"
        name="orientation"
        value={device.orientation}
        options={[
          { value: 'landscape', label: 'Landscape' },
          { value: 'portrait', label: 'Portrait' },
        ]}
        onChange={(orientation) => dispatch({ type: 'set-device', device: { ...device, orientation } })}
      />
      <div className="grid grid-cols-3 gap-2">
        <DraftField name="columns" label="Columns" value={grid.columns} format={String} check={(t) => checkNumber(t, 'number of columns', { isInteger: true, min: 4, max: 48 })} onCommit={(columns) => dispatch({ type: 'set-grid', grid: { ...grid, columns } })} isMono inputMode="numeric" />
        <DraftField name="rows" label="Rows" value={grid.rows} format={String} check={(t) => checkNumber(t, 'number of rows', { isInteger: true, min: 3, max: 48 })} onCommit={(rows) => dispatch({ type: 'set-grid', grid: { ...grid, rows } })} isMono inputMode="numeric" />
        <DraftField name="gap" label="Gap" unit="px" value={grid.gapPx} format={String} check={(t) => checkNumber(t, 'gap', { isInteger: true, min: 0, max: 32 })} onCommit={(gapPx) => dispatch({ type: 'set-grid', grid: { ...grid, gapPx } })} isMono inputMode="numeric" />
      </div>
      <p className="text-sm text-asphalt-400">
        Screen <span className="num text-asphalt-200">{screen.widthPx} × {screen.heightPx}</span> px; one cell{' '}
        <span className="num text-asphalt-200">
          {cell.widthPx.toFixed(1)} × {cell.heightPx.toFixed(1)}
        </span>{' '}
        px. Shrinking the grid moves tiles inside it.
      </p>
    </fieldset>
  );
}
