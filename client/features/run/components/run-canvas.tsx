import { fitScale, deviceSize } from '../../../../shared/domain/panels/grid';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import type { PanelDocument, Page, Tile } from '../../../../shared/schemas/panel';
import { useElementSize } from '../../../hooks/use-element-size';
import { TileView, type TileLive, type TileSeat } from '../../../components/panel-tiles/tile-view';

type RunCanvasProps = {
  document: PanelDocument;
  page: Page;
  live: TileLive;
  seat: TileSeat;
  /** Drawn with a thick danger frame: the relay link is down. */
  isLinkDown: boolean;
  onPress: (tile: Tile, value: ChannelValue) => void;
  onRelease: (tile: Tile, value: ChannelValue) => void;
};

/** The panel's page at the largest size that fits the space below the status strip, keeping the device's shape. */
export function RunCanvas({ document, page, live, seat, isLinkDown, onPress, onRelease }: RunCanvasProps) {
  const [areaRef, area] = useElementSize<HTMLDivElement>();
  const screen = deviceSize(document.device);
  const scale = fitScale(document.device, area, true);
  const theme = document.theme;
  return (
    <div ref={areaRef} className="relative flex min-h-0 flex-1 items-center justify-center overflow-hidden">
      {scale > 0 ? (
        <div
          data-testid="run-canvas"
          data-page={page.id}
          className="relative"
          style={{
            width: screen.widthPx * scale,
            height: screen.heightPx * scale,
            background: theme.canvas,
            outline: isLinkDown ? `4px solid ${theme.danger}` : 'none',
            outlineOffset: -4,
          }}
        >
          {page.tiles.map((tile) => (
            <TileView
              key={tile.id}
              tile={tile}
              theme={theme}
              device={document.device}
              grid={document.grid}
              mode="run"
              live={live}
              seat={seat}
              onPress={onPress}
              onRelease={onRelease}
            />
          ))}
          {page.tiles.length === 0 ? (
            <p className="absolute inset-0 grid place-items-center text-xl font-semibold" style={{ color: theme.muted }}>
              This page has no tiles yet.
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
