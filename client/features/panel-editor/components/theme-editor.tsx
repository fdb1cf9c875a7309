import { THEME_COLOUR_NAMES } from '../../../../shared/domain/panels/tile-catalogue';
import { THEME_COLOURS, type Theme } from '../../../../shared/schemas/panel';
import type { EditorAction } from '../model/editor-state';
import { checkHexColour } from '../model/property-rules';
import { DraftField } from './property-fields';

/** The panel's named colours; tiles refer to them by name, so a change here restyles every tile using it. */
export function ThemeEditor({ theme, canEdit, dispatch }: { theme: Theme; canEdit: boolean; dispatch: (a: EditorAction) => void }) {
  return (
    <fieldset disabled={!canEdit} className="flex flex-col gap-3">
      <legend className="mb-1 text-sm font-semibold text-asphalt-100">Theme colours</legend>
      {THEME_COLOURS.map((name) => (
        <div key={name} className="grid grid-cols-[2.75rem_1fr] items-end gap-2">
          <label className="relative block size-11 cursor-pointer overflow-hidden rounded-lg ring-1 ring-asphalt-500" style={{ background: theme[name] }} title={`Pick ${THEME_COLOUR_NAMES[name]}`}>
            <input
              type="color"
              aria-label={`${THEME_COLOUR_NAMES[name]} colour picker`}
              value={theme[name]}
              className="absolute inset-0 cursor-pointer opacity-0"
              onChange={(e) => dispatch({ type: 'set-theme-colour', name, hex: e.target.value, coalesceKey: 'picker' })}
              onBlur={() => dispatch({ type: 'seal' })}
            />
          </label>
          <DraftField
            name={`theme-${name}`}
            label={THEME_COLOUR_NAMES[name]}
            value={theme[name]}
            format={(v) => v}
            check={checkHexColour}
            onCommit={(hex) => dispatch({ type: 'set-theme-colour', name, hex, coalesceKey: 'text' })}
            onBlur={() => dispatch({ type: 'seal' })}
            isMono
          />
        </div>
      ))}
    </fieldset>
  );
}
