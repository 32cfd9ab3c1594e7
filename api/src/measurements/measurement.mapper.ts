import { summariseReadings } from '../engine/interface-evaluation';
import { formatLength, formatLengthValue } from '../engine/units';
import type { MeasurementResponseDto, MeasurementSummaryDto } from './dto/measurement.dto';
import { Measurement } from './entities/measurement.entity';

export function toMeasurementResponse(measurement: Measurement): MeasurementResponseDto {
  return {
    id: measurement.id,
    featureId: measurement.featureId,
    interfaceId: measurement.interfaceId,
    quantity: measurement.quantity,
    value: measurement.valueText,
    unit: measurement.unit,
    valueNm: measurement.valueNm,
    /** The reading in its unit, with as many decimals as the instrument resolves. */
    shown: formatLength(measurement.valueNm, measurement.unit, measurement.instrumentResolutionNm),
    instrument: {
      kind: measurement.instrumentKind,
      resolutionNm: measurement.instrumentResolutionNm,
      resolution: formatLengthValue(measurement.instrumentResolutionNm, measurement.unit),
      calibratedOn: measurement.instrumentCalibratedOn,
      note: measurement.instrumentNote,
    },
    temperatureC: measurement.temperatureC,
    takenBy: measurement.takenBy,
    takenAt: measurement.takenAt.toISOString(),
    footageId: measurement.footageId,
    footageTimeMs: measurement.footageTimeMs,
    note: measurement.note,
  };
}

/** Several readings of one subject summarised: mean and spread, shown in the unit of the latest reading. */
export function summariseMeasurements(measurements: Measurement[]): MeasurementSummaryDto | null {
  if (measurements.length === 0) return null;
  const unit = measurements[measurements.length - 1].unit;
  const { meanNm, spreadNm, resolutionNm, count } = summariseReadings(
    measurements.map((m) => ({ valueNm: m.valueNm, resolutionNm: m.instrumentResolutionNm })),
  );
  return {
    count,
    unit,
    meanNm,
    spreadNm,
    mean: formatLength(meanNm, unit, resolutionNm),
    spread: formatLength(spreadNm, unit, resolutionNm),
  };
}
