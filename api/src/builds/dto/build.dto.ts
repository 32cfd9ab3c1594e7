import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, Length, MaxLength } from 'class-validator';
import { BUILD_STATUSES, type BuildStatus } from '../entities/build.entity';

export class CreateBuildDto {
  @ApiProperty({ example: 'Motor-to-gearbox coupler' })
  @IsString()
  @Length(1, 200)
  title!: string;

  @ApiPropertyOptional({ example: '1980s compact pickup, electric conversion' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  vehicle?: string;

  @ApiPropertyOptional({ example: 'Couple the motor shaft to the original gearbox input without re-machining.' })
  @IsOptional()
  @IsString()
  @MaxLength(5000)
  goal?: string;

  @ApiPropertyOptional({ enum: BUILD_STATUSES })
  @IsOptional()
  @IsIn(BUILD_STATUSES)
  status?: BuildStatus;
}

export class UpdateBuildDto extends PartialType(CreateBuildDto) {}

export class BuildResponseDto {
  @ApiProperty() id!: string;
  @ApiProperty() workshopId!: string;
  @ApiProperty() title!: string;
  @ApiProperty() vehicle!: string;
  @ApiProperty() goal!: string;
  @ApiProperty({ enum: BUILD_STATUSES }) status!: BuildStatus;
  @ApiProperty() createdAt!: string;
  @ApiProperty() updatedAt!: string;
}
