import type { ReactNode } from 'react';
import { ink } from '@/theme/palette';
import { DEVIATION_UNIT_LABEL, formatDeviation, formatSpan } from './deviation-format';
import { toleranceZoneGeometry, TOLERANCE_LAYOUT, type DeviationUnit, type Rect, type ZoneUm } from './tolerance-zone-geometry';
import { DiagramFrame } from './diagram-frame';
import type { PatternIds } from './diagram-patterns';

export interface ToleranceZoneDiagramProps {
  /** The nominal size the zero line stands for, as people write it: "25 mm", "0.6690 in". */
  nominal: string;
  hole: ZoneUm | null;
  shaft: ZoneUm | null;
  /** e.g. "H7", or "given limits". */
  holeClass?: string;
  shaftClass?: string;
  measuredHole?: readonly number[];
  measuredShaft?: readonly number[];
  unit: DeviationUnit;
  title?: string;
}

const INK = ink.main;
const MUTED = ink.muted;
/** A white outline behind text keeps a label readable where it crosses a line or a pattern. */
const HALO = { stroke: ink.paper, strokeWidth: 6, paintOrder: 'stroke', strokeLinejoin: 'round' } as const;

/**
 * The classic zero-line chart of ISO 286-1: the hole's and the shaft's tolerance zones as bands
 * against the zero line (the nominal size), so a reader sees at a glance whether the bands leave a
 * gap (clearance), overlap (interference possible) or sit apart the other way round.
 */
export function ToleranceZoneDiagram(props: ToleranceZoneDiagramProps) {
  const geometry = toleranceZoneGeometry(props);
  const { plot } = geometry;
  const { margin } = TOLERANCE_LAYOUT;
  const title = props.title ?? `Tolerance zones at ${props.nominal}`;
  const description = describe(props);
  const holeName = `Hole${props.holeClass ? ` ${props.holeClass}` : ''}`;
  const shaftName = `Shaft${props.shaftClass ? ` ${props.shaftClass}` : ''}`;

  return (
    <DiagramFrame idPrefix="tz" width={geometry.width} height={geometry.height} title={title} description={description} testId="tolerance-zone-diagram">
      {(ids) => (
        <>

        {/* axis */}
        <line x1={plot.x} y1={plot.y} x2={plot.x} y2={plot.y + plot.height} stroke={INK} />
        {geometry.ticks.map((tick) => (
          <g key={tick.label}>
            <line x1={plot.x - 5} y1={tick.y} x2={plot.x} y2={tick.y} stroke={INK} />
            <text x={plot.x - 8} y={tick.y} fontSize={12} textAnchor="end" dominantBaseline="middle" fill={INK} {...HALO}>
              {tick.label}
            </text>
          </g>
        ))}
        <text
          transform={`translate(16 ${plot.y + plot.height / 2}) rotate(-90)`}
          fontSize={12}
          textAnchor="middle"
          dominantBaseline="middle"
          fill={INK}
        >
          {`Deviation from ${props.nominal}, ${DEVIATION_UNIT_LABEL[props.unit]}`}
        </text>

        {/* zones */}
        {geometry.hole && props.hole && (
          <rect data-testid="zone-hole" {...geometry.hole} fill={`url(#${ids.hatch})`} stroke={INK} strokeWidth={1.5} />
        )}
        {geometry.shaft && props.shaft && (
          <rect data-testid="zone-shaft" {...geometry.shaft} fill={`url(#${ids.dots})`} stroke={INK} strokeWidth={1.5} />
        )}
        {geometry.overlap && geometry.hole && geometry.shaft && (
          <g data-testid="zone-overlap">
            {/* guides at the two bounds, across both columns, so the shared sizes read against each zone */}
            {[geometry.overlap.y, geometry.overlap.y + geometry.overlap.height].map((y) => (
              <line key={y} x1={geometry.hole!.x} y1={y} x2={geometry.shaft!.x + geometry.shaft!.width} y2={y} stroke={ink.short} strokeDasharray="4 3" />
            ))}
            <rect {...geometry.overlap} fill={`url(#${ids.crosshatch})`} stroke={ink.short} strokeWidth={1.5} />
          </g>
        )}
        {geometry.gap && (
          <g data-testid="clearance-gap" stroke={INK}>
            <line x1={geometry.gap.x} y1={geometry.gap.y1} x2={geometry.gap.x} y2={geometry.gap.y2} />
            <line x1={geometry.gap.x - 5} y1={geometry.gap.y1} x2={geometry.gap.x + 5} y2={geometry.gap.y1} />
            <line x1={geometry.gap.x - 5} y1={geometry.gap.y2} x2={geometry.gap.x + 5} y2={geometry.gap.y2} />
          </g>
        )}
        {!props.hole && !props.shaft && (
          <text x={plot.x + plot.width / 2} y={plot.y + 14} fontSize={12} textAnchor="middle" fill={MUTED}>
            No tolerance class or limits given: only readings are shown
          </text>
        )}

        {/* zero line, drawn over the zones so it is never hidden */}
        <line
          data-testid="zero-line"
          x1={plot.x}
          y1={geometry.zeroY}
          x2={plot.x + plot.width}
          y2={geometry.zeroY}
          stroke={INK}
          strokeWidth={1.5}
          strokeDasharray="6 3"
        />
        <text x={plot.x - 8} y={geometry.zeroY + 13} fontSize={10} textAnchor="end" fill={MUTED} {...HALO}>
          nominal
        </text>

        {/* zone labels after the zero line, so no line runs through them */}
        {geometry.hole && props.hole && <ZoneLabels rect={geometry.hole} name={holeName} zone={props.hole} unit={props.unit} side="left" />}
        {geometry.shaft && props.shaft && <ZoneLabels rect={geometry.shaft} name={shaftName} zone={props.shaft} unit={props.unit} side="right" />}

        {/* readings */}
        {geometry.markers.map((marker, index) => (
          <g key={`${marker.feature}-${index}`} data-testid={`marker-${marker.feature}`}>
            <title>{`measured ${marker.feature === 'hole' ? 'bore' : 'shaft'} ${formatDeviation(marker.deviationUm, props.unit)}`}</title>
            {marker.feature === 'hole' ? (
              <circle cx={marker.x} cy={marker.y} r={5} fill={ink.paper} stroke={INK} strokeWidth={2} />
            ) : (
              <path
                d={`M${marker.x} ${marker.y - 6}L${marker.x + 6} ${marker.y}L${marker.x} ${marker.y + 6}L${marker.x - 6} ${marker.y}Z`}
                fill={INK}
                stroke={ink.paper}
                strokeWidth={1}
              />
            )}
          </g>
        ))}

        <Legend
          y={geometry.height - margin.bottom + 22}
          x={plot.x}
          ids={ids}
          props={props}
          holeName={holeName}
          shaftName={shaftName}
          overlap={geometry.overlap !== null}
        />
        </>
      )}
    </DiagramFrame>
  );
}

function ZoneLabels({
  rect,
  name,
  zone,
  unit,
  side,
}: {
  rect: Rect;
  name: string;
  zone: ZoneUm;
  unit: DeviationUnit;
  side: 'left' | 'right';
}) {
  // Limit labels sit outside the band (left of the hole, right of the shaft) and part when the band is thin.
  const push = Math.max(0, (16 - rect.height) / 2);
  const labelX = side === 'left' ? rect.x - 6 : rect.x + rect.width + 6;
  const anchor = side === 'left' ? 'end' : 'start';
  return (
    <g>
      <text x={rect.x + rect.width / 2} y={rect.y - 7} fontSize={12} fontWeight={600} textAnchor="middle" fill={INK} {...HALO}>
        {name}
      </text>
      <text x={labelX} y={rect.y - push} fontSize={11} textAnchor={anchor} dominantBaseline="middle" fill={INK} {...HALO}>
        {formatDeviation(zone.upper, unit)}
      </text>
      <text x={labelX} y={rect.y + rect.height + push} fontSize={11} textAnchor={anchor} dominantBaseline="middle" fill={INK} {...HALO}>
        {formatDeviation(zone.lower, unit)}
      </text>
    </g>
  );
}

function Legend({
  x,
  y,
  ids,
  props,
  holeName,
  shaftName,
  overlap,
}: {
  x: number;
  y: number;
  ids: PatternIds;
  props: ToleranceZoneDiagramProps;
  holeName: string;
  shaftName: string;
  overlap: boolean;
}) {
  const items: { key: string; swatch: ReactNode; text: string }[] = [];
  if (props.hole) items.push({ key: 'hole', swatch: <rect width={14} height={12} y={-9} fill={`url(#${ids.hatch})`} stroke={INK} />, text: `${holeName} zone` });
  if (props.shaft) items.push({ key: 'shaft', swatch: <rect width={14} height={12} y={-9} fill={`url(#${ids.dots})`} stroke={INK} />, text: `${shaftName} zone` });
  if (overlap) {
    const always = props.hole && props.shaft && props.hole.upper - props.shaft.lower <= 0;
    items.push({
      key: 'overlap',
      swatch: <rect width={14} height={12} y={-9} fill={`url(#${ids.crosshatch})`} stroke={ink.short} />,
      text: always ? 'shaft above hole: interferes' : 'overlap: may interfere',
    });
  }
  if (props.measuredHole?.length) items.push({ key: 'mh', swatch: <circle cx={7} cy={-3} r={5} fill={ink.paper} stroke={INK} strokeWidth={2} />, text: 'measured bore' });
  if (props.measuredShaft?.length) items.push({ key: 'ms', swatch: <path d="M7 -9L13 -3L7 3L1 -3Z" fill={INK} />, text: 'measured shaft' });

  const clearance = clearanceText(props);
  // Three entries a row keep the longest labels inside the picture.
  return (
    <g fontSize={12} fill={INK}>
      {items.map((item, index) => (
        <g key={item.key} transform={`translate(${x - 70 + (index % 3) * 190} ${y + Math.floor(index / 3) * 20})`}>
          {item.swatch}
          <text x={20} y={0} dominantBaseline="auto">
            {item.text}
          </text>
        </g>
      ))}
      {clearance && (
        <text x={x - 70} y={y + Math.ceil(items.length / 3) * 20 + 4} fontWeight={600} data-testid="clearance-text">
          {clearance}
        </text>
      )}
    </g>
  );
}

function clearanceText(props: ToleranceZoneDiagramProps): string | null {
  if (!props.hole || !props.shaft) return null;
  const min = props.hole.lower - props.shaft.upper;
  const max = props.hole.upper - props.shaft.lower;
  return `Clearance by the limits: ${formatSpan(min, props.unit)} to ${formatSpan(max, props.unit)}${min < 0 ? ' (below zero: interference)' : ''}`;
}

function describe(props: ToleranceZoneDiagramProps): string {
  const parts: string[] = [];
  const zone = (name: string, zone: ZoneUm) => `${name} from ${formatDeviation(zone.upper, props.unit)} to ${formatDeviation(zone.lower, props.unit)}`;
  if (props.hole) parts.push(zone(`Hole${props.holeClass ? ` ${props.holeClass}` : ''}`, props.hole));
  if (props.shaft) parts.push(zone(`shaft${props.shaftClass ? ` ${props.shaftClass}` : ''}`, props.shaft));
  if (props.hole && props.shaft) {
    const min = props.hole.lower - props.shaft.upper;
    const max = props.hole.upper - props.shaft.lower;
    parts.push(
      min >= 0
        ? 'the shaft zone sits below the hole zone, so every pair has clearance'
        : max <= 0
          ? 'the shaft zone sits above the hole zone, so every pair interferes'
          : 'the zones overlap, so some pairs interfere',
    );
  }
  const clearance = clearanceText(props);
  if (clearance) parts.push(clearance.toLowerCase());
  const readings = (name: string, values: readonly number[] | undefined) =>
    values?.length ? `${name} ${values.map((value) => formatDeviation(value, props.unit)).join(', ')}` : null;
  for (const text of [readings('measured bore', props.measuredHole), readings('measured shaft', props.measuredShaft)]) {
    if (text) parts.push(text);
  }
  return `Deviations from ${props.nominal}. ${parts.join('; ')}.`;
}
