import { useDroppable } from '@dnd-kit/core';
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent, type RefObject } from 'react';
import { cellSize, deviceSize, fitScale } from '../../../../shared/domain/panels/grid';
import type { ResizeHandle } from '../../../../shared/domain/panels/layout';
import type { PanelIssue } from '../../../../shared/domain/panels/check';
import type { Page, PanelDocument } from '../../../../shared/schemas/panel';
import type { EditorAction } from '../model/editor-state';
import { canvasPointerDown, dragPreview, dropRects, IDLE, marqueeRectPx, pointerCancel, pointerDown, pointerMove, pointerUp, resizePreview, resizeRect, type Gesture } from '../model/gesture';
import { keyIntent } from '../model/keyboard';
import { DesignTile, type TileMark } from './design-tile';

export const CANVAS_DROP_ID = 'panel-canvas';

/** Where the palette's drop handler finds the canvas: its element (unscaled device px inside) and scale. */
export type CanvasGeometry = { element: HTMLDivElement | null; scale: number };

type DesignCanvasProps = {
  doc: PanelDocument;
  page: Page;
  selection: readonly string[];
  issues: readonly PanelIssue[];
  canEdit: boolean;
  dispatch: (action: EditorAction) => void;
  /** Intents that need new ids (duplicate) are the designer's. */
  onDuplicate: () => void;
  geometryRef: RefObject<CanvasGeometry>;
};

/**
 * The device screen at its CSS size, scaled to fit, with the page's tiles. Pointer gestures run through the
 * gesture machine; only the dragged tiles re-render while the pointer moves, and the move is committed as one
 * step on release.
 */
export function DesignCanvas({ doc, page, selection, issues, canEdit, dispatch, onDuplicate, geometryRef }: DesignCanvasProps) {
  const areaRef = useRef<HTMLDivElement>(null);
  const surfaceRef = useRef<HTMLDivElement | null>(null);
  const [area, setArea] = useState({ widthPx: 0, heightPx: 0 });
  const [gesture, setGestureState] = useState<Gesture>(IDLE);
  // The gesture as of the latest event (state lags a render behind, and pointerup and lostpointercapture come together).
  const gestureRef = useRef<Gesture>(IDLE);
  const setGesture = useCallback((g: Gesture) => {
    gestureRef.current = g;
    setGestureState(g);
  }, []);
  const { setNodeRef, isOver } = useDroppable({ id: CANVAS_DROP_ID, disabled: !canEdit });

  const screen = deviceSize(doc.device);
  const scale = fitScale(doc.device, area, true);
  const cell = useMemo(() => {
    const c = cellSize(doc.device, doc.grid);
    return { widthPx: c.widthPx, heightPx: c.heightPx };
  }, [doc.device, doc.grid]);

  useLayoutEffect(() => {
    const el = areaRef.current;
    if (!el) return;
    const measure = () => setArea({ widthPx: el.clientWidth - 32, heightPx: el.clientHeight - 32 });
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  useEffect(() => {
    geometryRef.current = { element: surfaceRef.current, scale };
  }, [geometryRef, scale]);

  // Handlers read the newest state through refs, so the memoised tiles get callbacks that never change.
  const live = useRef({ selection, scale, cell, canEdit });
  live.current = { selection, scale, cell, canEdit };

  const toDevicePx = useCallback((clientX: number, clientY: number) => {
    const rect = surfaceRef.current!.getBoundingClientRect();
    const s = live.current.scale || 1;
    return { xPx: (clientX - rect.left) / s, yPx: (clientY - rect.top) / s };
  }, []);

  const onTilePointerDown = useCallback(
    (e: PointerEvent<HTMLElement>, tileId: string, handle: ResizeHandle | null) => {
      if (e.button !== 0) return;
      const g = gestureRef.current;
      const { selection: sel, canEdit: editable } = live.current;
      const at = toDevicePx(e.clientX, e.clientY);
      const step = pointerDown(g, { pointerId: e.pointerId, ...at, target: handle ? { kind: 'resize', tileId, handle } : { kind: 'move', tileId }, shiftKey: e.shiftKey }, sel);
      step.actions.forEach(dispatch);
      if (!editable) return;
      if (step.gesture !== g) {
        surfaceRef.current?.setPointerCapture(e.pointerId);
        setGesture(step.gesture);
      }
    },
    [dispatch, toDevicePx, setGesture],
  );

  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    const g = gestureRef.current;
    if (g.phase === 'idle') return;
    const next = pointerMove(g, { pointerId: e.pointerId, ...toDevicePx(e.clientX, e.clientY) }, selection);
    if (next !== g) setGesture(next);
  };
  const onPointerUp = (e: PointerEvent<HTMLDivElement>) => {
    const g = gestureRef.current;
    if (g.phase === 'idle') return;
    const step = pointerUp(g, { pointerId: e.pointerId }, cell, selection, page);
    setGesture(step.gesture);
    step.actions.forEach(dispatch);
  };
  const onPointerCancel = () => setGesture(pointerCancel());

  const onTileKeyDown = useCallback(
    (e: KeyboardEvent<HTMLElement>, tileId: string) => {
      if ((e.key === 'Enter' || e.key === ' ') && !e.ctrlKey && !e.metaKey) {
        e.preventDefault();
        dispatch({ type: 'select', ids: [tileId], mode: e.shiftKey ? 'toggle' : 'replace' });
        return;
      }
      const intent = keyIntent(e);
      if (!intent) return;
      // Keys act on the selection; a focused tile outside it becomes the selection first.
      if (!live.current.selection.includes(tileId) && intent.type !== 'undo' && intent.type !== 'redo' && intent.type !== 'select-all') {
        dispatch({ type: 'select', ids: [tileId], mode: 'replace' });
      }
      if (!live.current.canEdit && intent.type !== 'clear-selection' && intent.type !== 'select-all') return;
      e.preventDefault();
      e.stopPropagation();
      if (intent.type === 'nudge') dispatch({ type: 'move-selection', dx: intent.dx, dy: intent.dy });
      else if (intent.type === 'delete') dispatch({ type: 'delete-selection' });
      else if (intent.type === 'duplicate') onDuplicate();
      else dispatch({ type: intent.type });
    },
    [dispatch, onDuplicate],
  );

  const marks = useMemo(() => {
    const byTile = new Map<string, TileMark>();
    for (const issue of issues) {
      if (issue.pageId !== page.id) continue;
      for (const id of issue.tileIds) {
        const m = byTile.get(id);
        const severity = m?.severity === 'error' || issue.severity === 'error' ? 'error' : 'warning';
        byTile.set(id, { severity, count: (m?.count ?? 0) + 1 });
      }
    }
    return byTile;
  }, [issues, page.id]);

  const drag = dragPreview(gesture, cell);
  const resize = resizePreview(gesture, cell);
  const ghosts = drag ? dropRects(doc, page.id, drag) : resize ? [resizeRect(doc, page.id, resize)].filter((r) => r !== null) : [];
  const single = selection.length === 1 && gesture.phase !== 'dragging' ? selection[0] : undefined;
  const dragOffset = drag ? { xPx: drag.dxPx, yPx: drag.dyPx } : null;
  const marquee = marqueeRectPx(gesture);

  return (
    <div ref={areaRef} className="relative grid min-h-0 min-w-0 flex-1 place-items-center overflow-hidden bg-asphalt-950/60">
      <div style={{ width: screen.widthPx * scale, height: screen.heightPx * scale }} className="relative">
        <div
          ref={(el) => {
            surfaceRef.current = el;
            setNodeRef(el);
          }}
          data-testid="design-canvas"
          data-scale={scale.toFixed(4)}
          role="group"
          aria-label={`Canvas: page “${page.name}”, ${doc.grid.columns} × ${doc.grid.rows} cells, ${page.tiles.length} tiles`}
          className="absolute top-0 left-0 origin-top-left overflow-hidden rounded-md shadow-lift ring-1 ring-asphalt-600"
          style={{
            width: screen.widthPx,
            height: screen.heightPx,
            transform: `scale(${scale})`,
            background: doc.theme.canvas,
            backgroundImage: `linear-gradient(to right, ${doc.theme.muted}26 1px, transparent 1px), linear-gradient(to bottom, ${doc.theme.muted}26 1px, transparent 1px)`,
            backgroundSize: `${cell.widthPx}px ${cell.heightPx}px`,
            outline: isOver ? `3px solid var(--color-signal-400)` : undefined,
          }}
          onPointerDown={(e) => {
            if (e.target !== e.currentTarget || e.button !== 0) return;
            const step = canvasPointerDown(gestureRef.current, { pointerId: e.pointerId, ...toDevicePx(e.clientX, e.clientY), shiftKey: e.shiftKey });
            step.actions.forEach(dispatch);
            if (step.gesture !== gestureRef.current) {
              e.currentTarget.setPointerCapture(e.pointerId);
              setGesture(step.gesture);
            }
          }}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onPointerCancel={onPointerCancel}
          onLostPointerCapture={onPointerUp}
        >
          {page.tiles.map((t) => (
            <DesignTile
              key={t.id}
              tile={t}
              theme={doc.theme}
              device={doc.device}
              grid={doc.grid}
              isSelected={selection.includes(t.id)}
              hasHandles={t.id === single}
              mark={marks.get(t.id) ?? null}
              dragOffsetPx={drag && drag.tileIds.includes(t.id) ? dragOffset : null}
              canEdit={canEdit}
              onTilePointerDown={onTilePointerDown}
              onTileKeyDown={onTileKeyDown}
            />
          ))}
          {ghosts.map((r, i) => (
            <div
              key={i}
              aria-hidden="true"
              data-testid="drop-outline"
              className="pointer-events-none absolute rounded-[10px] border-2 border-dashed border-signal-400 bg-signal-500/10"
              style={{ left: r.x * cell.widthPx, top: r.y * cell.heightPx, width: r.w * cell.widthPx, height: r.h * cell.heightPx }}
            />
          ))}
          {marquee && (
            <div
              aria-hidden="true"
              data-testid="marquee"
              className="pointer-events-none absolute rounded-sm border-2 border-sky bg-sky/10"
              style={{ left: marquee.xPx, top: marquee.yPx, width: marquee.widthPx, height: marquee.heightPx }}
            />
          )}
          {page.tiles.length === 0 && (
            <div className="pointer-events-none absolute inset-0 grid place-items-center p-10 text-center">
              <p className="max-w-md rounded-xl bg-asphalt-900/85 px-6 py-5 text-lg text-asphalt-200 ring-1 ring-asphalt-600">
                {canEdit ? 'Drag a tile from the palette onto the grid, or press a tile in the palette to place it in the first free spot.' : 'This page has no tiles.'}
              </p>
            </div>
          )}
        </div>
      </div>
    </div>
  );
}
