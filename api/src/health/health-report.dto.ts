import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

class HealthChecksDto {
  @ApiProperty({ enum: ['up', 'down'] }) database!: 'up' | 'down';
  @ApiProperty({ enum: ['up', 'down'] }) storage!: 'up' | 'down';
  @ApiProperty({ enum: ['up', 'down'] }) mail!: 'up' | 'down';
  @ApiProperty({ enum: ['up', 'down'] }) queue!: 'up' | 'down';
}

export class HealthReportDto {
  @ApiPropertyOptional({ example: 503 }) statusCode?: number;
  @ApiPropertyOptional({ example: 'Down: mail' }) message?: string;
  @ApiProperty({ enum: ['ok', 'down'] }) status!: 'ok' | 'down';
  @ApiProperty({ type: HealthChecksDto }) checks!: HealthChecksDto;
}
