import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';
import { MAX_FOOTAGE_MS } from '../http/limits';

/** An optional UUID (a link given when known, or a filter): absent, or a UUID. The document shows it as a plain optional field. */
export function OptionalUuid(description?: string): PropertyDecorator {
  return applyDecorators(ApiPropertyOptional(description === undefined ? {} : { description }), IsOptional(), IsUUID());
}

/** An optional link to another row: a UUID, or null to untie it. (IsOptional lets null and absence through.) */
export function NullableUuid(description: string): PropertyDecorator {
  return applyDecorators(ApiPropertyOptional({ type: String, format: 'uuid', nullable: true, description }), IsOptional(), IsUUID());
}

/** An optional moment in a footage, in whole milliseconds, or null to clear it. */
export function NullableFootageTime(description: string, example?: number): PropertyDecorator {
  return applyDecorators(
    ApiPropertyOptional({ type: Number, nullable: true, description, example }),
    IsOptional(),
    IsInt(),
    Min(0),
    Max(MAX_FOOTAGE_MS, { message: '$property must be at most 86400000 (24 hours, in ms)' }),
  );
}
