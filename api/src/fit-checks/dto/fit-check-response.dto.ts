import { ApiProperty } from '@nestjs/swagger';
import { FIT_CHECK_STATES, type CheckOutcome, type ChecklistVerdict, type FitCheckState } from '../../engine/checklist';
import type { WhatIf } from '../../engine/measured-fit';
import { CHECK_KINDS, type CheckKind } from '../entities/fit-check.entity';
import { EVIDENCE_KINDS, type EvidenceKind } from '../entities/fit-check-evidence.entity';

const CHECK_OUTCOMES: CheckOutcome[] = ['pass', 'fail', 'unknown'];
export const CHECKLIST_VERDICTS: ChecklistVerdict[] = ['open', 'bench_pass', 'confirmed', 'no_fit'];

export class EvidenceResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: EVIDENCE_KINDS }) kind!: EvidenceKind;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) measurementId!: string | null;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) markId!: string | null;
  @ApiProperty({
    type: String,
    nullable: true,
    example: '/api/workshops/6f1c…/checks/2a9d…/evidence/7c3e…/photo',
    description: 'For a photo: its address on this API, which redirects to a short-lived storage link',
  })
  photoUrl!: string | null;
  @ApiProperty({ example: 'Coupler fully engaged, motor bolted up.' }) note!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) addedBy!: string | null;
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
}

export class FitCheckResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) assemblyId!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'Set for a check derived from an interface' })
  interfaceId!: string | null;
  @ApiProperty({ enum: CHECK_KINDS }) kind!: CheckKind;
  @ApiProperty({ description: 'Derived from an interface (true) or added by hand (false)' }) derived!: boolean;
  @ApiProperty({ example: 'Input spline matches the motor shaft' }) title!: string;
  @ApiProperty({ example: true }) required!: boolean;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState' }) state!: FitCheckState;
  @ApiProperty({ enum: CHECK_OUTCOMES, nullable: true, description: "The engine's last verdict for a derived check" })
  outcome!: CheckOutcome | null;
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    nullable: true,
    example: { minClearanceNm: 2_540, clearanceMeasuredNm: 12_700 },
    description: "The engine's numbers for a derived check (nanometres unless a key says otherwise)",
  })
  detail!: Record<string, unknown> | null;
  @ApiProperty({ example: 'Test-fitted with the motor bolted up; turns by hand with no bind.' }) reason!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) confirmedBy!: string | null;
  @ApiProperty({ type: String, format: 'date-time', nullable: true }) confirmedAt!: string | null;
  @ApiProperty({ type: [EvidenceResponseDto], description: 'Oldest first' }) evidence!: EvidenceResponseDto[];
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}

export class ChecklistResponseDto {
  @ApiProperty({ enum: CHECKLIST_VERDICTS, enumName: 'ChecklistVerdict', description: 'The roll-up of the required checks' })
  verdict!: ChecklistVerdict;
  @ApiProperty({ type: [FitCheckResponseDto], description: 'In the order they were added' }) checks!: FitCheckResponseDto[];
}

export class FitCheckEventResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState', nullable: true, description: 'Null for the first state' })
  from!: FitCheckState | null;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState' }) to!: FitCheckState;
  @ApiProperty({ example: 'Bore re-measured after honing' }) reason!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true, description: 'Null when the fit engine changed the state' })
  actorId!: string | null;
  @ApiProperty({ type: String, nullable: true, example: 'Rowan Hale', description: "The member's display name; null for the fit engine" })
  actorName!: string | null;
  @ApiProperty({ format: 'date-time' }) at!: string;
}

/** A part `delta` larger (or smaller) against the interface's measured clearance. */
export class WhatIfResponseDto implements WhatIf {
  @ApiProperty({ example: 406_400, description: 'The measured clearance, nm' }) clearanceNm!: number;
  @ApiProperty({ example: 10_160, description: 'The change in size, nm' }) deltaNm!: number;
  @ApiProperty({ example: 10.16 }) deltaUm!: number;
  @ApiProperty({ example: 0.4 }) deltaThou!: number;
  @ApiProperty({ type: Number, nullable: true, example: 2.5, description: 'Share of the clearance the change takes, %; null without a positive clearance' })
  sharePercent!: number | null;
  @ApiProperty({ example: 396_240 }) remainingClearanceNm!: number;
  @ApiProperty({ enum: ['clearance', 'interference'] }) remainingKind!: 'clearance' | 'interference';
}
