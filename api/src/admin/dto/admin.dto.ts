import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { AdminWorkshopView } from '../../workshops/dto/workshop-views.dto';
import { SessionUserDto } from '../../users/dto/session-user.dto';
import { NumberFromText } from '../../common/decorators/number-from-text.decorator';

export class AdminSearchDto {
  @ApiPropertyOptional({ description: 'Part of a name, e-mail address or web address' })
  @IsOptional()
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @MaxLength(100)
  search?: string;

  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @IsOptional()
  @NumberFromText()
  @IsInt({ message: 'Page must be a whole number' })
  @Min(1, { message: 'Page must be 1 or more' })
  @Max(10_000)
  page?: number;
}

export class AdminUserDto extends SessionUserDto {
  @ApiProperty() disabled!: boolean;
  @ApiProperty() createdAt!: string;
}

export class AdminUserPageDto {
  @ApiProperty({ type: [AdminUserDto] }) items!: AdminUserDto[];
  @ApiProperty() total!: number;
  @ApiProperty() page!: number;
  @ApiProperty() pageSize!: number;
}

export class AdminWorkshopPageDto {
  @ApiProperty({ type: [AdminWorkshopView] }) items!: AdminWorkshopView[];
  @ApiProperty() total!: number;
  @ApiProperty() page!: number;
  @ApiProperty() pageSize!: number;
}
