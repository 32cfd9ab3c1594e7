import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, Length, MaxLength } from 'class-validator';
import { NullableUuid } from '../../common/decorators/nullable-fields.decorator';
import { FIT_REPORT_OUTCOMES, FIT_REPORT_STATUSES, type FitReportOutcome, type FitReportStatus } from '../entities/fit-report.entity';

export class CreateFitReportDto {
  @ApiProperty({ enum: FIT_REPORT_OUTCOMES })
  @IsIn(FIT_REPORT_OUTCOMES)
  outcome!: FitReportOutcome;

  @ApiProperty({ example: 'HL-2107 coupler on the original 5-speed input shaft, BD adapter plate' })
  @IsString()
  @Length(1, 2000)
  parts!: string;

  @ApiPropertyOptional({ example: '1986 compact pickup, 4x2' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  vehicle?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(5000)
  notes?: string;
}

export class UpdateFitReportDto {
  @ApiPropertyOptional({ enum: FIT_REPORT_STATUSES })
  @IsOptional()
  @IsIn(FIT_REPORT_STATUSES)
  status?: FitReportStatus;

  @ApiPropertyOptional({ description: 'Shown to the reporter' })
  @IsOptional()
  @IsString()
  @MaxLength(1000)
  creatorNote?: string;

  @NullableUuid('A fit check of this workshop that verifies the claim; null unties it')
  fitCheckId?: string | null;
}

export class FitReportsQueryDto {
  @ApiPropertyOptional({ enum: FIT_REPORT_STATUSES })
  @IsOptional()
  @IsIn(FIT_REPORT_STATUSES)
  status?: FitReportStatus;
}
