import { toMeasurementResponse } from '../measurements/measurement.mapper';
import { Measurement } from '../measurements/entities/measurement.entity';
import { Mark } from './entities/mark.entity';
import { MarkSuggestion } from './entities/mark-suggestion.entity';
import type { AcceptedSuggestionResponseDto, MarkResponseDto, MarkSuggestionResponseDto } from './dto/mark-response.dto';

export function toMarkResponse(mark: Mark): MarkResponseDto {
  return {
    id: mark.id,
    footageId: mark.footageId,
    startMs: mark.startMs,
    endMs: mark.endMs,
    kind: mark.kind,
    partId: mark.partId,
    measurementId: mark.measurementId,
    fitCheckId: mark.fitCheckId,
    guideStepId: mark.guideStepId,
    label: mark.label,
    createdBy: mark.createdBy,
    createdAt: mark.createdAt.toISOString(),
    updatedAt: mark.updatedAt.toISOString(),
  };
}

export function toSuggestionResponse(suggestion: MarkSuggestion): MarkSuggestionResponseDto {
  return {
    id: suggestion.id,
    footageId: suggestion.footageId,
    transcriptId: suggestion.transcriptId,
    cueIndex: suggestion.cueIndex,
    startMs: suggestion.startMs,
    endMs: suggestion.endMs,
    kind: suggestion.kind,
    phrase: suggestion.phrase,
    value: suggestion.value,
    unit: suggestion.unit,
    millimetres: suggestion.millimetres,
    partId: suggestion.partId,
    status: suggestion.status,
    markId: suggestion.markId,
  };
}

export function toAcceptedResponse(result: { suggestion: MarkSuggestion; mark: Mark; measurement: Measurement | null }): AcceptedSuggestionResponseDto {
  return {
    suggestion: toSuggestionResponse(result.suggestion),
    mark: toMarkResponse(result.mark),
    measurement: result.measurement ? toMeasurementResponse(result.measurement) : null,
  };
}
