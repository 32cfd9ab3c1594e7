import { formatReadableLength, unitLabel } from '@/lib/units';
import { ink } from '@/theme/palette';
import { lengthWindowGeometry, type LengthWindowInput, type Span } from './length-window-geometry';
import { DiagramFrame } from './diagram-frame';

export interface LengthWindowDiagramProps extends LengthWindowInput {
  title?: string;
}

const INK = ink.main;
const SHORT = ink.short;

/**
 * One length axis with two bars: the part's own range (fully compressed to fully extended) above,
 * the installed length at its extremes below. Travel left at each end is bracketed between them,
 * and the margin the creator asked for is shaded at the part's ends.
 */
export function LengthWindowDiagram(props: LengthWindowDiagramProps) {
  const geometry = lengthWindowGeometry(props);
  const { plot, partRow, installedRow } = geometry;
  const show = (nanometres: number) => formatReadableLength(nanometres, props.unit);
  const axisY = installedRow.y + installedRow.height + 34;
  const legendY = axisY + 44;
  const bracketY = partRow.y + partRow.height + 26;

  return (
    <DiagramFrame idPrefix="lw" width={geometry.width} height={geometry.height} title={props.title ?? 'Length window'} description={describe(props)} testId="length-window-diagram">
      {(ids) => (
        <>

        {/* row names */}
        <RowName y={partRow.y + partRow.height / 2} x={plot.x - 10} lines={['Part', 'plunge range']} />
        <RowName y={installedRow.y + installedRow.height / 2} x={plot.x - 10} lines={['Installed', 'length range']} />

        {/* guides from each end of one bar to the other */}
        {[geometry.part.x1, geometry.part.x2].map((x, index) => (
          <line key={`pg${index}`} x1={x} y1={partRow.y} x2={x} y2={installedRow.y + installedRow.height} stroke={ink.guide} strokeDasharray="3 3" />
        ))}

        {/* part bar with the margin shaded at its ends */}
        <rect
          data-testid="part-range"
          x={geometry.part.x1}
          y={partRow.y}
          width={Math.max(geometry.part.x2 - geometry.part.x1, 1.5)}
          height={partRow.height}
          fill={`url(#${ids.hatch})`}
          stroke={INK}
          strokeWidth={1.5}
        />
        {geometry.marginZones.map((zone, index) => (
          <rect
            key={`m${index}`}
            data-testid="margin-zone"
            x={zone.x1}
            y={partRow.y}
            width={Math.max(zone.x2 - zone.x1, 0)}
            height={partRow.height}
            fill={`url(#${ids.crosshatch})`}
            stroke={INK}
          />
        ))}
        <EndLabels span={geometry.part} y={partRow.y - 8} left={show(props.compressedNm)} right={show(props.extendedNm)} />

        {/* installed bar */}
        <rect
          data-testid="installed-range"
          x={geometry.installed.x1}
          y={installedRow.y}
          width={Math.max(geometry.installed.x2 - geometry.installed.x1, 1.5)}
          height={installedRow.height}
          fill={`url(#${ids.dots})`}
          stroke={INK}
          strokeWidth={1.5}
        />
        <EndLabels
          span={geometry.installed}
          y={installedRow.y + installedRow.height + 16}
          left={show(props.installedMinNm)}
          right={show(props.installedMaxNm)}
        />

        {/* travel left each way */}
        <Bracket testId="compression-left" span={geometry.compressionLeft} y={bracketY} short={geometry.compressionLeft.short} text={travelText(geometry.compressionLeft.nanometres, show)} />
        <Bracket testId="extension-left" span={geometry.extensionLeft} y={bracketY} short={geometry.extensionLeft.short} text={travelText(geometry.extensionLeft.nanometres, show)} />

        {/* axis */}
        <line x1={plot.x} y1={axisY} x2={plot.x + plot.width} y2={axisY} stroke={INK} />
        {geometry.ticks.map((tick) => (
          <g key={tick.value}>
            <line x1={tick.x} y1={axisY} x2={tick.x} y2={axisY + 5} stroke={INK} />
            <text x={tick.x} y={axisY + 18} fontSize={11} textAnchor="middle" fill={INK}>
              {tick.value.toFixed(Math.max(0, -Math.floor(Math.log10(tick.step))))}
            </text>
          </g>
        ))}
        <text x={plot.x + plot.width + 4} y={axisY + 4} fontSize={11} fill={INK}>
          {unitLabel(props.unit)}
        </text>

        {/* legend */}
        <g fontSize={12} fill={INK}>
          <rect x={plot.x - 100} y={legendY - 10} width={14} height={12} fill={`url(#${ids.hatch})`} stroke={INK} />
          <text x={plot.x - 80} y={legendY}>part: compressed to extended</text>
          <rect x={plot.x + 140} y={legendY - 10} width={14} height={12} fill={`url(#${ids.dots})`} stroke={INK} />
          <text x={plot.x + 160} y={legendY}>installed: shortest to longest</text>
          {props.marginNm > 0 && (
            <>
              <rect x={plot.x - 100} y={legendY + 10} width={14} height={12} fill={`url(#${ids.crosshatch})`} stroke={INK} />
              <text x={plot.x - 80} y={legendY + 20}>{`margin to keep clear: ${show(props.marginNm)} each end`}</text>
            </>
          )}
          <text x={plot.x + (props.marginNm > 0 ? 260 : -100)} y={legendY + 20}>
            ⟷ travel left at that end
          </text>
        </g>
        </>
      )}
    </DiagramFrame>
  );
}

function RowName({ x, y, lines }: { x: number; y: number; lines: string[] }) {
  return (
    <text x={x} y={y - 7} fontSize={12} fontWeight={600} textAnchor="end" fill={INK}>
      {lines.map((line, index) => (
        <tspan key={line} x={x} dy={index === 0 ? 0 : 14}>
          {line}
        </tspan>
      ))}
    </text>
  );
}

/** The two end values of a bar; when the bar is short they lean outwards so they do not overprint. */
function EndLabels({ span, y, left, right }: { span: Span; y: number; left: string; right: string }) {
  const close = span.x2 - span.x1 < 90;
  return (
    <g fontSize={11} fill={INK}>
      <text x={span.x1} y={y} textAnchor={close ? 'end' : 'middle'}>
        {left}
      </text>
      <text x={span.x2} y={y} textAnchor={close ? 'start' : 'middle'}>
        {right}
      </text>
    </g>
  );
}

function Bracket({ span, y, short, text, testId }: { span: Span; y: number; short: boolean; text: string; testId: string }) {
  const colour = short ? SHORT : INK;
  return (
    <g data-testid={testId} data-short={short} stroke={colour}>
      <line x1={span.x1} y1={y} x2={span.x2} y2={y} strokeWidth={2} strokeDasharray={short ? '5 3' : undefined} />
      <line x1={span.x1} y1={y - 6} x2={span.x1} y2={y + 6} strokeWidth={2} />
      <line x1={span.x2} y1={y - 6} x2={span.x2} y2={y + 6} strokeWidth={2} />
      <text x={(span.x1 + span.x2) / 2} y={y - 8} fontSize={11} fontWeight={600} textAnchor="middle" fill={colour} stroke="none">
        {text}
      </text>
    </g>
  );
}

function travelText(nanometres: number, show: (nanometres: number) => string): string {
  return nanometres < 0 ? `short ${show(-nanometres)}` : `${show(nanometres)} left`;
}

function describe(props: LengthWindowDiagramProps): string {
  const show = (nanometres: number) => formatReadableLength(nanometres, props.unit);
  const compression = props.installedMinNm - props.compressedNm;
  const extension = props.extendedNm - props.installedMaxNm;
  const travel = (name: string, nanometres: number, failure: string) =>
    nanometres < 0 ? `${failure} by ${show(-nanometres)}` : `${name} left ${show(nanometres)}`;
  return [
    `The part runs from ${show(props.compressedNm)} fully compressed to ${show(props.extendedNm)} fully extended`,
    `the installed length runs from ${show(props.installedMinNm)} to ${show(props.installedMaxNm)}`,
    travel('compression', compression, 'bottoms out'),
    travel('extension', extension, 'pulls apart'),
    props.marginNm > 0 ? `margin asked for: ${show(props.marginNm)} each end` : 'no margin set',
  ].join('; ').concat('.');
}
