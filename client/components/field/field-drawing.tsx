import { createContext, useContext } from 'react';
import { robotFootprint } from '../../../shared/domain/geometry/footprint';
import type { Point2d } from '../../../shared/domain/geometry/pose2d';
import { fieldPlan, type FieldPlan, type Segment } from '../../../shared/domain/season/field-plan';
import type { Alliance, SeasonProfile } from '../../../shared/domain/season/season-profile';

/** Okabe–Ito colour-blind-safe palette: vermilion for red, blue for blue. */
export const ALLIANCE_COLOURS: Record<Alliance, string> = { red: '#D55E00', blue: '#0072B2' };

const INK = '#1F2328';
const SURFACE = '#F3F2EE';
const STRUCTURE = '#8C8C86';
const LINE_M = 0.03;
const LETTER_M = 0.13;
const TARGET_RADIUS_M = 0.12;

export type RobotLayer = {
  kind: 'robot';
  id: string;
  xM: number;
  yM: number;
  headingDeg: number;
  widthM: number;
  lengthM: number;
  colour: string;
};
export type TrailLayer = { kind: 'trail'; id: string; points: Point2d[]; colour: string };
export type TargetLayer = {
  kind: 'target';
  id: string;
  xM: number;
  yM: number;
  /** Draws a tick toward this heading when given. */
  headingDeg?: number;
  colour: string;
  label?: string;
  /** Drawn filled and heavier, e.g. the target a table row points at. */
  isHighlighted?: boolean;
};
export type FieldLayer = RobotLayer | TrailLayer | TargetLayer;

/** A rectangle of the field in field metres (+y up), e.g. to show one reef close up. */
export type FieldWindow = { xMinM: number; yMinM: number; xMaxM: number; yMaxM: number };

export type FieldDrawingProps = {
  season: SeasonProfile;
  /** Drawn in order, on top of the field. */
  layers?: readonly FieldLayer[];
  /** Shows only this part of the field, still to scale; the whole field with its margin when omitted. */
  window?: FieldWindow;
  /** Pointer over a target marker (its id), or off it (null). */
  onTargetHover?: (id: string | null) => void;
  /** A click or tap on a target marker. */
  onTargetSelect?: (id: string) => void;
  /**
   * Whose side to draw it from: `blue` (default) puts the blue alliance wall on the left as the field layout
   * does; `red` turns the field 180° about its centre so the red wall is on the left, letters kept upright.
   */
  viewFrom?: Alliance;
  /** Accessible name of the drawing. */
  title?: string;
  className?: string;
};

const pointsAttr = (points: readonly Point2d[]) => points.map((p) => `${p.xM},${p.yM}`).join(' ');

/** Degrees the field is turned for the viewer; text turns back by as much to stay upright. */
const ViewTurn = createContext(0);

/** Upright text at a field point inside the y-flipped group. */
function Label({ at, text, size = LETTER_M }: { at: Point2d; text: string; size?: number }) {
  const turnDeg = useContext(ViewTurn);
  return (
    <text
      transform={`translate(${at.xM} ${at.yM}) rotate(${-turnDeg}) scale(1 -1)`}
      fontSize={size}
      textAnchor="middle"
      dominantBaseline="central"
      fill={INK}
      fontFamily="Barlow, sans-serif"
    >
      {text}
    </text>
  );
}

/** A straight field segment drawn as one line. */
function SegmentLine({
  segment,
  element,
  colour,
  widthM,
  dash,
}: {
  segment: Segment;
  element?: string;
  colour: string;
  widthM: number;
  dash?: string;
}) {
  return (
    <line
      data-element={element}
      x1={segment.from.xM}
      y1={segment.from.yM}
      x2={segment.to.xM}
      y2={segment.to.yM}
      stroke={colour}
      strokeWidth={widthM}
      strokeDasharray={dash}
    />
  );
}

type TargetHandlers = Pick<FieldDrawingProps, 'onTargetHover' | 'onTargetSelect'>;

/** The SVG viewBox of a field window: y is negated because the drawing flips it inside scale(1, −1). */
export function windowViewBox(w: FieldWindow): FieldPlan['viewBox'] {
  return { minX: w.xMinM, minY: -w.yMaxM, width: w.xMaxM - w.xMinM, height: w.yMaxM - w.yMinM };
}

/** The same window as seen after turning the field 180° about its centre (the red alliance's view). */
export function turnedWindow(w: FieldWindow, lengthM: number, widthM: number): FieldWindow {
  return { xMinM: lengthM - w.xMaxM, xMaxM: lengthM - w.xMinM, yMinM: widthM - w.yMaxM, yMaxM: widthM - w.yMinM };
}

function Layer({ layer, onTargetHover, onTargetSelect }: { layer: FieldLayer } & TargetHandlers) {
  switch (layer.kind) {
    case 'robot': {
      const f = robotFootprint(layer, layer.lengthM, layer.widthM);
      return (
        <g data-layer="robot" data-id={layer.id}>
          <polygon points={pointsAttr(f.corners)} fill={layer.colour} fillOpacity={0.35} stroke={layer.colour} strokeWidth={LINE_M} />
          <line x1={layer.xM} y1={layer.yM} x2={f.noseM.xM} y2={f.noseM.yM} stroke={INK} strokeWidth={LINE_M} />
        </g>
      );
    }
    case 'trail':
      return (
        <polyline
          data-layer="trail"
          data-id={layer.id}
          points={pointsAttr(layer.points)}
          fill="none"
          stroke={layer.colour}
          strokeWidth={LINE_M}
          strokeLinejoin="round"
        />
      );
    case 'target': {
      const isInteractive = onTargetHover !== undefined || onTargetSelect !== undefined;
      const strokeM = layer.isHighlighted ? LINE_M * 2 : LINE_M;
      return (
        <g
          data-layer="target"
          data-id={layer.id}
          data-highlighted={layer.isHighlighted || undefined}
          style={isInteractive ? { cursor: 'pointer' } : undefined}
          onPointerEnter={onTargetHover && (() => onTargetHover(layer.id))}
          onPointerLeave={onTargetHover && (() => onTargetHover(null))}
          onClick={onTargetSelect && (() => onTargetSelect(layer.id))}
        >
          <g transform={`translate(${layer.xM} ${layer.yM}) rotate(${layer.headingDeg ?? 0})`}>
            <circle
              r={layer.isHighlighted ? TARGET_RADIUS_M * 1.25 : TARGET_RADIUS_M}
              // A transparent fill, not none, so the whole disc takes the pointer.
              fill={layer.isHighlighted ? layer.colour : 'transparent'}
              fillOpacity={layer.isHighlighted ? 0.35 : undefined}
              stroke={layer.colour}
              strokeWidth={strokeM}
            />
            {layer.headingDeg !== undefined && (
              <line x1={0} y1={0} x2={TARGET_RADIUS_M * 2} y2={0} stroke={layer.colour} strokeWidth={strokeM} />
            )}
          </g>
          {layer.label !== undefined && <Label at={{ xM: layer.xM, yM: layer.yM }} text={layer.label} size={LETTER_M * 0.8} />}
        </g>
      );
    }
  }
}

/** The season's field to scale, in metres with +y up, plus robot, trail and target layers. */
export function FieldDrawing({
  season,
  layers = [],
  window,
  title = 'Field map',
  className,
  onTargetHover,
  onTargetSelect,
  viewFrom = 'blue',
}: FieldDrawingProps) {
  const plan = fieldPlan(season);
  const lengthM = season.field.lengthM.value;
  const widthM = season.field.widthM.value;
  const turnDeg = viewFrom === 'red' ? 180 : 0;
  const shown = window && turnDeg ? turnedWindow(window, lengthM, widthM) : window;
  // The whole field's margin is the same on every side, so its viewBox does not change when turned.
  const { minX, minY, width, height } = shown ? windowViewBox(shown) : plan.viewBox;
  return (
    <svg
      viewBox={`${minX} ${minY} ${width} ${height}`}
      role="img"
      aria-label={title}
      className={className}
      preserveAspectRatio="xMidYMid meet"
    >
      <title>{title}</title>
      <ViewTurn.Provider value={turnDeg}>
      <g transform={`scale(1 -1) rotate(${turnDeg} ${lengthM / 2} ${widthM / 2})`} data-view-from={viewFrom}>
        <polygon points={pointsAttr(plan.outline)} fill={SURFACE} stroke={INK} strokeWidth={LINE_M * 2} />
        <SegmentLine segment={plan.centreLine} colour={STRUCTURE} widthM={LINE_M} dash="0.1 0.1" />
        {plan.startingLines.map((s) => (
          <SegmentLine
            key={`start-${s.alliance}`}
            segment={s}
            element="starting-line"
            colour={ALLIANCE_COLOURS[s.alliance]}
            widthM={LINE_M * 1.5}
            dash="0.25 0.12"
          />
        ))}
        <polygon
          data-element="barge"
          points={pointsAttr(plan.barge.corners)}
          fill={STRUCTURE}
          fillOpacity={0.3}
          stroke={STRUCTURE}
          strokeWidth={LINE_M}
        />
        {plan.barge.cages.map((c) => (
          <circle
            key={`cage-${c.alliance}-${c.name}`}
            data-element="cage"
            cx={c.at.xM}
            cy={c.at.yM}
            r={0.15}
            fill="none"
            stroke={ALLIANCE_COLOURS[c.alliance]}
            strokeWidth={LINE_M * 1.5}
          />
        ))}
        {plan.coralStations.map((s) => (
          <SegmentLine
            key={`station-${s.alliance}-${s.name}`}
            segment={s}
            element="coral-station"
            colour={ALLIANCE_COLOURS[s.alliance]}
            widthM={LINE_M * 3}
          />
        ))}
        {plan.processors.map((p) => (
          <SegmentLine
            key={`processor-${p.alliance}`}
            segment={p}
            element="processor"
            colour={ALLIANCE_COLOURS[p.alliance]}
            widthM={LINE_M * 4}
          />
        ))}
        {plan.reefs.map((reef) => (
          <g key={`reef-${reef.alliance}`} data-element="reef" data-alliance={reef.alliance}>
            <polygon
              points={pointsAttr(reef.outline)}
              fill={ALLIANCE_COLOURS[reef.alliance]}
              fillOpacity={0.18}
              stroke={ALLIANCE_COLOURS[reef.alliance]}
              strokeWidth={LINE_M * 1.5}
            />
            {reef.branches.map((b) => (
              <g key={b.letter} data-branch={b.letter}>
                <circle cx={b.at.xM} cy={b.at.yM} r={0.035} fill={INK} />
                <Label at={b.labelAt} text={b.letter} />
              </g>
            ))}
          </g>
        ))}
        {layers.map((layer) => (
          <Layer key={`${layer.kind}-${layer.id}`} layer={layer} onTargetHover={onTargetHover} onTargetSelect={onTargetSelect} />
        ))}
      </g>
      </ViewTurn.Provider>
    </svg>
  );
}
