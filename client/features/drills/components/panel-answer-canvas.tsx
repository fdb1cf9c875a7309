import { useMemo } from 'react';
import { CALL_PART_CHANNELS, type CallPart } from '../../../../shared/domain/drills/drill-calls';
import { deviceSize, fitScale } from '../../../../shared/domain/panels/grid';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import type { Page, PanelDocument, Tile } from '../../../../shared/schemas/panel';
import { useElementSize } from '../../../hooks/use-element-size';
import { TileView, type TileLive } from '../../../components/panel-tiles/tile-view';
import { tapFromTile } from '../model/drill-panel';

type PanelAnswerCanvasProps = {
  document: PanelDocument;
  page: Page;
  selection: Partial<Record<CallPart, string>>;
  onTap: (part: CallPart, value: string) => void;
};

/** The published panel's page drawn in run mode at the largest size that fits; taps on its pickers answer the call. */
export function PanelAnswerCanvas({ document, page, selection, onTap }: PanelAnswerCanvasProps) {
  const [areaRef, area] = useElementSize<HTMLDivElement>();
  const screen = deviceSize(document.device);
  const scale = fitScale(document.device, area, true);
  // The drill shows the operator's own selection since the call; nothing here reaches a robot.
  const live = useMemo<TileLive>(
    () => ({
      canWrite: true,
      channels: Object.fromEntries((Object.keys(CALL_PART_CHANNELS) as CallPart[]).map((p) => [CALL_PART_CHANNELS[p], selection[p] === undefined ? undefined : { value: selection[p] }])),
    }),
    [selection],
  );
  const handlePress = (tile: Tile, value: ChannelValue) => {
    const tap = tapFromTile(tile, value);
    if (tap) onTap(tap.part, tap.value);
  };
  return (
    <div ref={areaRef} className="relative flex h-full min-h-0 items-start justify-center overflow-hidden">
      {scale > 0 && (
        <div
          data-testid="drill-panel-canvas"
          className="relative rounded-lg"
          style={{ width: screen.widthPx * scale, height: screen.heightPx * scale, background: document.theme.canvas }}
        >
          {page.tiles.map((tile) => (
            <TileView key={tile.id} tile={tile} theme={document.theme} device={document.device} grid={document.grid} mode="run" live={live} onPress={handlePress} />
          ))}
        </div>
      )}
    </div>
  );
}
