import { Table, Text } from '@mantine/core';
import type { ReactNode } from 'react';
import { formatLength, unitLabel, type LengthUnit } from '@/lib/units';
import type { Measurement } from '../api/queries';
import { INSTRUMENT_LABELS, QUANTITY_LABELS } from './measurement-labels';
import { formatDate } from '@/lib/dates';

export interface ReadingsTableProps {
  measurements: Measurement[];
  /** The unit of the "converted" column. */
  unit: LengthUnit;
  /** A cell of actions per row (remove, attach as evidence …). */
  renderActions?: (measurement: Measurement) => ReactNode;
}

/**
 * Each reading as it was taken and in the unit asked for. The converted value keeps the decimals
 * the instrument resolves in that unit (a 0.0001 in micrometer shows 0.001 mm), so a conversion
 * never claims more precision than the reading had.
 */
export function ReadingsTable({ measurements, unit, renderActions }: ReadingsTableProps) {
  return (
    <Table.ScrollContainer minWidth={640}>
      <Table striped withTableBorder aria-label="Readings" fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>As taken</Table.Th>
            <Table.Th>Converted ({unitLabel(unit)})</Table.Th>
            <Table.Th>Quantity</Table.Th>
            <Table.Th>Instrument</Table.Th>
            <Table.Th>Conditions</Table.Th>
            <Table.Th>Taken</Table.Th>
            {renderActions && <Table.Th aria-label="Actions" />}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {measurements.map((measurement) => (
            <Table.Tr key={measurement.id} data-testid="reading-row">
              <Table.Td ff="monospace" data-testid="reading-as-taken">
                {measurement.shown}
              </Table.Td>
              <Table.Td ff="monospace" data-testid="reading-converted">
                {formatLength(measurement.valueNm, unit, measurement.instrument.resolutionNm)}
              </Table.Td>
              <Table.Td>{QUANTITY_LABELS[measurement.quantity]}</Table.Td>
              <Table.Td>
                {INSTRUMENT_LABELS[measurement.instrument.kind]}
                <Text size="xs" c="dimmed">
                  reads to {measurement.instrument.resolution} {unitLabel(measurement.unit)}
                  {measurement.instrument.calibratedOn && `, calibrated ${measurement.instrument.calibratedOn}`}
                </Text>
              </Table.Td>
              <Table.Td>
                {measurement.temperatureC !== null ? `${measurement.temperatureC} °C` : '—'}
                {measurement.note && (
                  <Text size="xs" c="dimmed">
                    {measurement.note}
                  </Text>
                )}
              </Table.Td>
              <Table.Td>{formatDate(measurement.takenAt)}</Table.Td>
              {renderActions && <Table.Td>{renderActions(measurement)}</Table.Td>}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
