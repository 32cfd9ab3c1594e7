import { splineDiametersGeometry, type SplineDiameterName } from './spline-diameters-geometry';
import { fitColours, ink } from '@/theme/palette';
import { DiagramFrame } from './diagram-frame';

export interface SplineDiametersDiagramProps {
  /** e.g. "21T 16/32 DP 30° flat root side fit (ANSI B92.1)". */
  designation: string;
  unit: 'in' | 'mm';
  diameters: Readonly<Record<SplineDiameterName, number>>;
}

const INK = ink.main;

/**
 * The key diameters of an involute spline: the hub's teeth (internal) and the shaft's tooth
 * (external) side on, with a line and a label for each diameter. Heights to scale, widths schematic.
 */
export function SplineDiametersDiagram(props: SplineDiametersDiagramProps) {
  const geometry = splineDiametersGeometry(props);
  const { plot } = geometry;
  const labelX = plot.x + plot.width + 16;

  return (
    <DiagramFrame idPrefix="sd" width={geometry.width} height={geometry.height} title={`Key diameters of ${props.designation}`} description={describe(props)} testId="spline-diameters-diagram">
      {(ids) => (
        <>

        {geometry.hubTeeth.map((points, index) => (
          <polygon key={`hub${index}`} data-testid="hub-tooth" points={points} fill={`url(#${ids.dots})`} stroke={INK} strokeWidth={1.5} />
        ))}
        <polygon data-testid="shaft-tooth" points={geometry.shaftTooth} fill={`url(#${ids.hatch})`} stroke={INK} strokeWidth={1.5} />

        {geometry.lines.map((line) => (
          <g key={line.name} data-testid={`diameter-${line.name}`}>
            <line
              x1={plot.x}
              x2={plot.x + plot.width}
              y1={line.y}
              y2={line.y}
              stroke={line.name === 'pitchDiameter' ? fitColours.fit : ink.slate}
              strokeDasharray={line.name === 'pitchDiameter' ? '8 4' : line.name === 'baseDiameter' ? '2 3' : undefined}
              strokeWidth={line.name === 'pitchDiameter' ? 1.5 : 1}
            />
            <line x1={plot.x + plot.width} x2={labelX - 4} y1={line.y} y2={line.labelY} stroke={ink.guide} />
            <text x={labelX} y={line.labelY + 4} fontSize={12} fill={INK}>
              {line.label}: {formatSplineDiameter(line.value, props.unit)} {props.unit}
            </text>
          </g>
        ))}

        <text x={plot.x} y={plot.y - 8} fontSize={11} fill={ink.slate}>
          Hub (dotted) over shaft (hatched); heights to scale, widths schematic
        </text>
        </>
      )}
    </DiagramFrame>
  );
}

/** Four places in inches and three in millimetres, as spline drawings usually carry them. */
export function formatSplineDiameter(value: number, unit: 'in' | 'mm'): string {
  return value.toFixed(unit === 'in' ? 4 : 3);
}

function describe(props: SplineDiametersDiagramProps): string {
  const d = props.diameters;
  const format = (value: number) => formatSplineDiameter(value, props.unit);
  return (
    `${props.designation}. Internal major diameter ${format(d.internalMajorDiameter)} ${props.unit}, ` +
    `external major ${format(d.externalMajorDiameter)}, pitch ${format(d.pitchDiameter)}, ` +
    `internal minor ${format(d.internalMinorDiameter)}, external minor ${format(d.externalMinorDiameter)}, ` +
    `base ${format(d.baseDiameter)} ${props.unit}.`
  );
}
