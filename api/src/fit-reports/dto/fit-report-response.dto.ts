import { ApiProperty } from '@nestjs/swagger';
import { FIT_CHECK_STATES, type FitCheckState } from '../../engine/checklist';
import { FIT_REPORT_OUTCOMES, FIT_REPORT_STATUSES, type FitReportOutcome, type FitReportStatus } from '../entities/fit-report.entity';

export class FitReportCheckDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'Test-fitted on the vehicle: coupler engages fully' }) title!: string;
  @ApiProperty({ enum: FIT_CHECK_STATES, enumName: 'FitCheckState' }) state!: FitCheckState;
  @ApiProperty({ example: '21-tooth coupler' }) assemblyName!: string;
}

export class FitReportGuideDto {
  @ApiProperty({ example: 'Swapping the motor coupler' }) title!: string;
  @ApiProperty({ example: '/guides/hollow-lane-garage/swapping-the-motor-coupler', description: "The public guide's path in the studio" })
  path!: string;
}

export class FitReportBuildDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ example: 'Van conversion drive line' }) title!: string;
}

export class FitReportWorkshopDto {
  @ApiProperty({ example: 'Hollow Lane Garage' }) name!: string;
  @ApiProperty({ example: 'hollow-lane-garage' }) slug!: string;
}

export class FitReportReporterDto {
  @ApiProperty({ example: 'Rowan Hale' }) displayName!: string;
}

export class FitReportPhotoDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({
    example: '/api/fit-reports/3b1f…/photos/9e2c…',
    description: "Address on this API (the reporter's or the workshop's route) that redirects to a short-lived storage link",
  })
  url!: string;
}

/** A fit report as its reporter or the workshop's editors read it. */
export class FitReportResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: FIT_REPORT_OUTCOMES }) outcome!: FitReportOutcome;
  @ApiProperty({ example: 'HL-2107 coupler with the DS-540 shaft' }) parts!: string;
  @ApiProperty({ example: '2009 panel van, 2.2 diesel' }) vehicle!: string;
  @ApiProperty({ example: 'Slid on by hand, no play.' }) notes!: string;
  @ApiProperty({ enum: FIT_REPORT_STATUSES }) status!: FitReportStatus;
  @ApiProperty({ example: '', description: "The workshop's word to the reporter" }) creatorNote!: string;
  @ApiProperty({ type: FitReportCheckDto, nullable: true, description: 'The fit check that verifies the claim' })
  fitCheck!: FitReportCheckDto | null;
  @ApiProperty({ type: FitReportGuideDto, nullable: true, description: 'Null once the guide is deleted or its workshop is gone' })
  guide!: FitReportGuideDto | null;
  @ApiProperty({ type: FitReportBuildDto }) build!: FitReportBuildDto;
  @ApiProperty({ type: FitReportWorkshopDto }) workshop!: FitReportWorkshopDto;
  @ApiProperty({ type: FitReportReporterDto }) reporter!: FitReportReporterDto;
  @ApiProperty({ type: [FitReportPhotoDto] }) photos!: FitReportPhotoDto[];
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}
