import { Alert, Badge, Button, Group, Paper, Stack, Table, Text, TextInput } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { splitApiErrors } from '@/lib/form-errors';
import { fromNanometres, parseLength, toNanometres, type LengthUnit } from '@/lib/units';
import { splineToolQueries, type SplineCandidate, type SplineIdentifyQuery } from '../api/queries';
import { FormProblems } from '@/components/form-problems';

export type IdentifiedPitch = { system: 'diametral'; diametralPitch: number; stubPitch: number } | { system: 'module'; module: number };

export interface SplineIdentifyOfferProps {
  teeth: number | string;
  gender: 'internal' | 'external';
  /** The major diameter as written on the form (a shaft's outside diameter). */
  majorDiameter: string;
  unit: LengthUnit;
  onUse: (pitch: IdentifiedPitch) => void;
}

const SHOWN_CANDIDATES = 5;

/** "16/32" → diametral 16, stub 32; "m1.25" → module 1.25. */
export function pitchFromDesignation(pitch: string): IdentifiedPitch | null {
  const fraction = /^(\d+(?:\.\d+)?)\/(\d+(?:\.\d+)?)$/.exec(pitch);
  if (fraction) return { system: 'diametral', diametralPitch: Number(fraction[1]), stubPitch: Number(fraction[2]) };
  const metric = /^m(\d+(?:\.\d+)?)$/.exec(pitch);
  return metric ? { system: 'module', module: Number(metric[1]) } : null;
}

/**
 * The reading as the identify route takes it: in inches or millimetres (thou and tenths go to inches,
 * µm to millimetres, exactly), with the resolution its written decimals state ("1.375" → 0.001 in).
 * A unit written in the text ("1.2505 in") wins over the form's. Null when the text is not a length.
 */
export function readingForIdentify(text: string, formUnit: LengthUnit): { value: number; unit: 'in' | 'mm'; resolution?: number } | null {
  let parsed: ReturnType<typeof parseLength>;
  try {
    parsed = parseLength(text, formUnit);
  } catch {
    return null;
  }
  const unit = parsed.unit;
  const sent: 'in' | 'mm' = unit === 'in' || unit === 'thou' || unit === 'tenths' ? 'in' : 'mm';
  const decimals = parsed.decimalPlaces;
  const resolution = decimals === null || decimals === 0 ? undefined : stepIn(decimals, unit, sent);
  return { value: fromNanometres(parsed.nanometres, sent), unit: sent, resolution };
}

/** One step of the last written decimal ("0.001" for three places) in `sent`; undefined below a nanometre. */
function stepIn(decimals: number, unit: LengthUnit, sent: 'in' | 'mm'): number | undefined {
  try {
    return fromNanometres(toNanometres(`0.${'0'.repeat(decimals - 1)}1`, unit), sent);
  } catch {
    return undefined;
  }
}

/**
 * Offered where a part's spline is recorded: from the tooth count and a measured diameter, the
 * API's ranked candidate designations, with the inch/metric swap flagged; "Use" fills the pitch.
 */
export function SplineIdentifyOffer({ teeth, gender, majorDiameter, unit, onUse }: SplineIdentifyOfferProps) {
  const [bore, setBore] = useState('');
  const [asked, setAsked] = useState<SplineIdentifyQuery | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const answer = useQuery({ ...splineToolQueries.identify(asked ?? { teeth: 0, unit: 'mm' }), enabled: asked !== null });
  const apiErrors = answer.isError ? splitApiErrors(answer.error, {}) : { fields: {}, general: [] };
  const external = gender === 'external';
  const written = external ? majorDiameter : bore;

  const handleIdentify = () => {
    const count = Number(teeth);
    if (!Number.isInteger(count) || count <= 0) return setProblem('Count the teeth first.');
    const reading = readingForIdentify(written, unit);
    if (!reading) return setProblem(external ? 'Write the measured major diameter first.' : 'Write the measured bore first.');
    setProblem(null);
    setAsked({
      teeth: count,
      ...(external ? { majorDiameter: reading.value } : { minorDiameter: reading.value }),
      unit: reading.unit,
      ...(reading.resolution === undefined ? {} : { resolution: reading.resolution }),
    });
  };

  const data = answer.data;
  return (
    <Paper withBorder p="sm" data-testid="spline-identify-offer">
      <Stack gap="xs">
        <Text size="sm">
          Pitch not known? Count the teeth and measure the {external ? 'major (outside) diameter of the shaft' : 'bore (minor diameter) of the hub'}:
          the standard sizes that explain the reading are listed, best first.
        </Text>
        <Group align="flex-end">
          {!external && (
            <TextInput label="Measured bore (minor diameter)" placeholder="1.250" value={bore} onChange={(event) => setBore(event.currentTarget.value)} />
          )}
          <Button variant="light" onClick={handleIdentify} loading={answer.isFetching}>
            Identify from the measured diameter
          </Button>
        </Group>
        {problem && (
          <Text size="sm" c="red" role="alert">
            {problem}
          </Text>
        )}
        <FormProblems messages={apiErrors.general} title="No candidates" />
        {data && (
          <>
            {data.pitfalls.map((pitfall) => (
              <Alert key={pitfall} color="yellow" title="Inch or metric?" data-testid="spline-pitfall">
                {pitfall}
              </Alert>
            ))}
            <Table aria-label="Candidate designations">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Designation</Table.Th>
                  <Table.Th>Basic diameter</Table.Th>
                  <Table.Th>Reading − basic</Table.Th>
                  <Table.Th />
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {data.candidates.slice(0, SHOWN_CANDIDATES).map((candidate) => (
                  <CandidateRow key={candidate.designation} candidate={candidate} onUse={onUse} />
                ))}
              </Table.Tbody>
            </Table>
            <Text size="xs" c="dimmed">
              {data.rule}
            </Text>
          </>
        )}
      </Stack>
    </Paper>
  );
}

function CandidateRow({ candidate, onUse }: { candidate: SplineCandidate; onUse: (pitch: IdentifiedPitch) => void }) {
  const pitch = pitchFromDesignation(candidate.pitch);
  const basic = candidate.basicDiameter;
  const deviation = candidate.deviation;
  return (
    <Table.Tr>
      <Table.Td>
        {candidate.designation}
        {candidate.explainsReading && (
          <Badge ml="xs" size="xs" variant="outline">
            explains the reading
          </Badge>
        )}
      </Table.Td>
      <Table.Td ff="monospace">
        {basic.value} {basic.unit}
        {basic.unit !== deviation.unit ? ` (${basic.converted.value} ${basic.converted.unit})` : ''}
      </Table.Td>
      <Table.Td ff="monospace">
        {deviation.value > 0 ? '+' : ''}
        {deviation.value} {deviation.unit}
      </Table.Td>
      <Table.Td>
        {pitch && (
          <Button size="compact-xs" variant="subtle" onClick={() => onUse(pitch)} aria-label={`Use ${candidate.designation}`}>
            Use
          </Button>
        )}
      </Table.Td>
    </Table.Tr>
  );
}
