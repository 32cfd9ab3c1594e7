import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsNotIn, IsOptional, IsString, Length, Matches, MaxLength } from 'class-validator';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const slugify = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value);

/** Words the studio uses in its own addresses. */
export const RESERVED_SLUGS = [
  'new', 'admin', 'api', 'account', 'settings', 'workshops', 'invitations', 'sign-in', 'sign-up', 'docs', 'assets', 'static',
];

export class CreateWorkshopDto {
  @ApiProperty({ example: 'Harrow Lane Garage', maxLength: 120 })
  @Transform(trim)
  @IsString({ message: 'Name is required' })
  @Length(2, 120, { message: 'Name must be 2 to 120 characters' })
  name!: string;

  @ApiProperty({ example: 'harrow-lane-garage', description: 'The workshop in web addresses' })
  @Transform(slugify)
  @IsString({ message: 'Web address is required' })
  @Length(3, 60, { message: 'Web address must be 3 to 60 characters' })
  @Matches(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, {
    message: 'Web address may use lower-case letters, digits and single hyphens between them',
  })
  @IsNotIn(RESERVED_SLUGS, { message: 'That web address is reserved; choose another' })
  slug!: string;

  @ApiPropertyOptional({ example: 'Electric conversions of compact pickups', maxLength: 500 })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MaxLength(500, { message: 'Description must be at most 500 characters' })
  description?: string;
}

export class UpdateWorkshopDto {
  @ApiPropertyOptional({ maxLength: 120 })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @Length(2, 120, { message: 'Name must be 2 to 120 characters' })
  name?: string;

  @ApiPropertyOptional({ description: 'Changing it changes the workshop’s web addresses' })
  @IsOptional()
  @Transform(slugify)
  @IsString()
  @Length(3, 60, { message: 'Web address must be 3 to 60 characters' })
  @Matches(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, {
    message: 'Web address may use lower-case letters, digits and single hyphens between them',
  })
  @IsNotIn(RESERVED_SLUGS, { message: 'That web address is reserved; choose another' })
  slug?: string;

  @ApiPropertyOptional({ maxLength: 500 })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MaxLength(500, { message: 'Description must be at most 500 characters' })
  description?: string;

  @ApiPropertyOptional({ description: 'Show members’ names on public pages (who confirmed a fit); off by default' })
  @IsOptional()
  @IsBoolean({ message: 'showMemberNames must be true or false' })
  showMemberNames?: boolean;
}

export class DeleteWorkshopDto {
  @ApiProperty({ description: 'The workshop’s name, typed again: deleting cannot be undone' })
  @IsString()
  @MaxLength(120)
  confirmName!: string;
}
