import { ArgumentMetadata, BadRequestException, Injectable, PipeTransform } from '@nestjs/common';

/** Types that a body parameter may be declared as and still take a non-object (none of our DTOs does). */
const NOT_A_DTO: unknown[] = [Array, Object, String, Number, Boolean];

/**
 * A body declared as a DTO class must arrive as a JSON object. class-validator validates an array or a bare
 * value given in its place as if it were an empty object, so without this check `[]` or `42` reached services.
 */
@Injectable()
export class ObjectBodyPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type !== 'body' || typeof metadata.metatype !== 'function' || NOT_A_DTO.includes(metadata.metatype)) return value;
    if (value === undefined || (value !== null && typeof value === 'object' && !Array.isArray(value))) return value;
    const got = value === null ? 'null' : Array.isArray(value) ? 'an array' : `a ${typeof value}`;
    throw new BadRequestException({
      message: [`The request body must be a JSON object, not ${got}`],
      errors: { body: `must be a JSON object, not ${got}` },
      error: 'Bad Request',
      code: 'body_not_object',
    });
  }
}
