import { Alert, Button, Group, Select, Stack, Text, TextInput } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { formatReadableLength, LENGTH_UNITS, unitLabel, type LengthUnit } from '@/lib/units';
import { fitCheckQueries } from '../api/queries';

const DECIMAL = /^\s*-?(\d+(\.\d*)?|\.\d+)\s*$/;

function round(value: number, places: number): string {
  return String(Number(value.toFixed(places)));
}

/** "What if the replacement shaft is 0.0004 in larger?": how much of the measured clearance that takes. */
export function WhatIfPanel({ workshopId, interfaceId, defaultUnit }: { workshopId: string; interfaceId: string; defaultUnit: LengthUnit }) {
  const [delta, setDelta] = useState('');
  const [unit, setUnit] = useState<LengthUnit>(defaultUnit);
  const [asked, setAsked] = useState<{ delta: string; unit: LengthUnit } | null>(null);
  const [inputError, setInputError] = useState<string | undefined>();
  const answer = useQuery({
    ...fitCheckQueries.whatIf(workshopId, interfaceId, asked?.delta ?? '', asked?.unit ?? unit),
    enabled: asked !== null,
  });

  const handleSubmit = () => {
    if (!DECIMAL.test(delta)) {
      setInputError('The size change must be a number such as 0.0004, or -0.01 for a smaller shaft');
      // The answer shown belongs to the previous change: take it away with that change.
      setAsked(null);
      return;
    }
    setAsked({ delta: delta.trim(), unit });
  };

  const result = answer.data;
  const smaller = result !== undefined && result.deltaNm < 0;
  return (
    <Stack gap="xs">
      <form
        onSubmit={(event) => {
          event.preventDefault();
          handleSubmit();
        }}
        aria-label="What-if: a bigger or smaller shaft"
      >
        <Group align="flex-start" gap="sm" wrap="wrap">
          <TextInput
            label="What if the shaft were larger by"
            description="negative for a smaller shaft"
            placeholder="0.0004"
            styles={{ input: { fontFamily: 'ui-monospace, monospace' } }}
            value={delta}
            onChange={(event) => {
              setDelta(event.currentTarget.value);
              setInputError(undefined);
            }}
            error={inputError}
            w={250}
          />
          <Select
            label="Unit"
            description="of the change"
            data={LENGTH_UNITS.map((value) => ({ value, label: unitLabel(value) }))}
            value={unit}
            onChange={(value) => value && setUnit(value as LengthUnit)}
            allowDeselect={false}
            w={110}
          />
          {/* The inputs carry a description line; the button sits level with the boxes, not the labels. */}
          <Button type="submit" variant="light" mt={46} loading={answer.isFetching}>
            Work it out
          </Button>
        </Group>
      </form>
      {answer.isError && (
        <Alert color="orange" title="No answer yet">
          {/* The API names its field by its wire name; here the field is the size change. */}
          {answer.error.message.replace(/^delta\b/, 'The size change')}
        </Alert>
      )}
      {result && asked && (
        <Text size="sm" data-testid="what-if-answer">
          A shaft {asked.delta.replace(/^-/, '')} {unitLabel(asked.unit)} {smaller ? 'smaller' : 'larger'} (
          {round(Math.abs(result.deltaUm), 2)} µm, {round(Math.abs(result.deltaThou), 3)} thou){' '}
          {result.sharePercent === null ? (
            <>leaves no clearance to share</>
          ) : smaller ? (
            <>
              gives back <strong>{round(-result.sharePercent, 1)} %</strong> of the measured clearance of{' '}
              {formatReadableLength(result.clearanceNm, asked.unit)}
            </>
          ) : (
            <>
              takes <strong>{round(result.sharePercent, 1)} %</strong> of the measured clearance of{' '}
              {formatReadableLength(result.clearanceNm, asked.unit)}
            </>
          )}
          , leaving {formatReadableLength(result.remainingClearanceNm, asked.unit)}
          {result.remainingKind === 'interference' ? ': the parts would interfere.' : ' of clearance.'}
        </Text>
      )}
    </Stack>
  );
}
