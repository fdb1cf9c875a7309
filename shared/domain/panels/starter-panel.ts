// Pure: imports only shared files. The document a new panel starts with: the chosen device, a grid of
// roughly 80 px cells fitted to it, Pitwall's default panel theme (the tile catalogue's) and one empty page.
import { DEVICE_PRESETS, type Device, type DevicePreset, type Grid, type PanelDocument } from '../../schemas/panel';
import { DEFAULT_PANEL_THEME } from './tile-catalogue';

/** The tablet a panel is laid out for when nobody chose one. */
export const STARTER_DEVICE: Device = { preset: 'tablet-1280x800', widthPx: 1280, heightPx: 800, orientation: 'landscape' };

/** Roughly the size of one grid cell in CSS px: a 1280 × 800 screen gets 16 × 10 cells. */
export const STARTER_CELL_PX = 80;
export const STARTER_GAP_PX = 8;

/** A preset device held landscape or portrait. */
export function presetDevice(preset: DevicePreset, orientation: Device['orientation'] = 'landscape'): Device {
  const { widthPx, heightPx } = DEVICE_PRESETS[preset];
  return { preset, widthPx, heightPx, orientation };
}

/** The grid for a device: about STARTER_CELL_PX per cell across the screen as held, within the schema's limits. */
export function starterGrid(device: Device): Grid {
  const acrossPx = device.orientation === 'portrait' ? device.heightPx : device.widthPx;
  const downPx = device.orientation === 'portrait' ? device.widthPx : device.heightPx;
  return {
    columns: clamp(Math.round(acrossPx / STARTER_CELL_PX), 4, 48),
    rows: clamp(Math.round(downPx / STARTER_CELL_PX), 3, 48),
    gapPx: STARTER_GAP_PX,
  };
}

/** A new panel's first version: the device (default STARTER_DEVICE), its grid, the theme and one empty page. */
export function starterPanelDocument(device: Device = STARTER_DEVICE): PanelDocument {
  return {
    device: { ...device },
    grid: starterGrid(device),
    theme: { ...DEFAULT_PANEL_THEME },
    pages: [{ id: 'main', name: 'Main', tiles: [] }],
  };
}

function clamp(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
}
