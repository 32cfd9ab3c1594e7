import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Length } from 'class-validator';
import { PREFERRED_UNITS, type PreferredUnits } from '../../common/types/access-context';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class UpdateProfileDto {
  @ApiPropertyOptional({ example: 'Rowan Avery', minLength: 1, maxLength: 80 })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @Length(1, 80, { message: 'Display name must be 1 to 80 characters' })
  displayName?: string;

  @ApiPropertyOptional({ enum: PREFERRED_UNITS, description: 'How lengths are shown: millimetres or inches' })
  @IsOptional()
  @IsIn(PREFERRED_UNITS, { message: 'Preferred units must be metric or inch' })
  preferredUnits?: PreferredUnits;
}
