import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Length, Matches, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { LENGTH_UNITS, type LengthUnit } from '../../engine/units';
import { INTERFACE_KINDS, type InterfaceKind } from '../entities/assembly-interface.entity';
import { PartResponseDto } from '../../parts/dto/part-response.dto';

const LENGTH = /^\s*(\d+(\.\d*)?|\.\d+)(\s+\d+\/\d+)?\s*$|^\s*\d+\/\d+\s*$/;

export class CreateAssemblyDto {
  @ApiProperty({ example: '21-tooth coupler with the long driveshaft' })
  @IsString()
  @Length(1, 200)
  name!: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(10000)
  notes?: string;
}

export class UpdateAssemblyDto extends PartialType(CreateAssemblyDto) {}

export class PlacePartDto {
  @ApiProperty({ example: 'input side' })
  @IsString()
  @Length(1, 80)
  position!: string;

  @ApiPropertyOptional({ example: 1 })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(1000)
  sortOrder?: number;
}

export class CreateInterfaceDto {
  @ApiProperty({ enum: INTERFACE_KINDS })
  @IsIn(INTERFACE_KINDS)
  kind!: InterfaceKind;

  @ApiProperty({ example: 'coupler to gearbox input' })
  @IsString()
  @Length(1, 160)
  name!: string;

  @ApiProperty({ description: 'spline: one spline; bore_shaft: the hole or the shaft; length_window: the length feature' })
  @IsUUID()
  featureAId!: string;

  @ApiPropertyOptional({ description: 'spline: the mating spline; bore_shaft: the other diameter' })
  @ValidateIf((dto: CreateInterfaceDto) => dto.kind !== 'length_window')
  @IsUUID()
  featureBId?: string;

  @ApiPropertyOptional({ enum: LENGTH_UNITS, default: 'mm', description: 'Unit of installedMin, installedMax and margin' })
  @IsOptional()
  @IsIn(LENGTH_UNITS)
  unit?: LengthUnit;

  @ApiPropertyOptional({ example: '530', description: 'length_window: shortest installed length' })
  @ValidateIf((dto: CreateInterfaceDto) => dto.kind === 'length_window')
  @Matches(LENGTH, { message: 'installedMin must be a length such as 530' })
  installedMin?: string;

  @ApiPropertyOptional({ example: '555', description: 'length_window: longest installed length' })
  @ValidateIf((dto: CreateInterfaceDto) => dto.kind === 'length_window')
  @Matches(LENGTH, { message: 'installedMax must be a length such as 555' })
  installedMax?: string;

  @ApiPropertyOptional({
    example: '5',
    description: 'length_window: travel that must remain each way; bore_shaft: the least clearance you accept',
  })
  @IsOptional()
  @Matches(LENGTH, { message: 'margin must be a length such as 5' })
  margin?: string;
}

export class UpdateInterfaceDto extends PartialType(CreateInterfaceDto) {}

export class AssemblyResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ format: 'uuid' }) buildId!: string;
  @ApiProperty({ example: '21-tooth coupler with the long driveshaft' }) name!: string;
  @ApiProperty({ example: '' }) notes!: string;
  @ApiProperty({ format: 'date-time' }) createdAt!: string;
  @ApiProperty({ format: 'date-time' }) updatedAt!: string;
}

export class InterfaceResponseDto {
  @ApiProperty({ format: 'uuid' }) id!: string;
  @ApiProperty({ enum: INTERFACE_KINDS }) kind!: InterfaceKind;
  @ApiProperty({ example: 'Motor shaft into coupler' }) name!: string;
  @ApiProperty({ format: 'uuid' }) featureAId!: string;
  @ApiProperty({ type: String, format: 'uuid', nullable: true }) featureBId!: string | null;
  @ApiProperty({ enum: LENGTH_UNITS, description: 'The unit lengths are shown in (feature A’s)' }) unit!: LengthUnit;
  @ApiProperty({ type: Number, nullable: true }) installedMinNm!: number | null;
  @ApiProperty({ type: Number, nullable: true }) installedMaxNm!: number | null;
  @ApiProperty({ type: Number, nullable: true }) marginNm!: number | null;
  @ApiProperty({ type: String, nullable: true, example: '412.0' }) installedMin!: string | null;
  @ApiProperty({ type: String, nullable: true, example: '418.5' }) installedMax!: string | null;
  @ApiProperty({ type: String, nullable: true, example: '3.0' }) margin!: string | null;
}

export class AssemblyPlacementDto {
  @ApiProperty({ example: 'input side' }) position!: string;
  @ApiProperty({ example: 0 }) sortOrder!: number;
  @ApiProperty({ type: PartResponseDto }) part!: PartResponseDto;
}

/** The assembly with its parts (and their features) and interfaces. */
export class AssemblyDetailDto extends AssemblyResponseDto {
  @ApiProperty({ type: [AssemblyPlacementDto], description: 'By sortOrder, then position' }) parts!: AssemblyPlacementDto[];
  @ApiProperty({ type: [InterfaceResponseDto] }) interfaces!: InterfaceResponseDto[];
}
