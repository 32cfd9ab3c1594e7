import { FitCheckEvent } from './entities/fit-check-event.entity';
import { FitCheckEvidence } from './entities/fit-check-evidence.entity';
import { FitCheck } from './entities/fit-check.entity';
import type { EvidenceResponseDto, FitCheckEventResponseDto, FitCheckResponseDto } from './dto/fit-check-response.dto';

export function toEvidenceResponse(evidence: FitCheckEvidence, workshopId: string): EvidenceResponseDto {
  return {
    id: evidence.id,
    kind: evidence.kind,
    measurementId: evidence.measurementId,
    markId: evidence.markId,
    /** For a photo: its address on this API, which redirects to a short-lived storage link. */
    photoUrl: evidence.photoKey
      ? `/api/workshops/${workshopId}/checks/${evidence.fitCheckId}/evidence/${evidence.id}/photo`
      : null,
    note: evidence.note,
    addedBy: evidence.addedBy,
    createdAt: evidence.createdAt.toISOString(),
  };
}

export function toFitCheckResponse(check: FitCheck, evidence: FitCheckEvidence[] = []): FitCheckResponseDto {
  return {
    id: check.id,
    assemblyId: check.assemblyId,
    interfaceId: check.interfaceId,
    kind: check.kind,
    derived: check.interfaceId !== null,
    title: check.title,
    required: check.required,
    state: check.state,
    outcome: check.outcome,
    detail: check.detail,
    reason: check.reason,
    confirmedBy: check.confirmedBy,
    confirmedAt: check.confirmedAt?.toISOString() ?? null,
    evidence: evidence.map((item) => toEvidenceResponse(item, check.workshopId)),
    updatedAt: check.updatedAt.toISOString(),
  };
}

/** `actorName`: the member's display name; only members (and site admins) read this history, never the public page. */
export function toFitCheckEventResponse(event: FitCheckEvent, actorNames: ReadonlyMap<string, string> = new Map()): FitCheckEventResponseDto {
  return {
    id: event.id,
    from: event.fromState,
    to: event.toState,
    reason: event.reason,
    actorId: event.actorId,
    actorName: event.actorId ? (actorNames.get(event.actorId) ?? null) : null,
    at: event.createdAt.toISOString(),
  };
}
