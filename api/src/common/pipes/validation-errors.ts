import { BadRequestException } from '@nestjs/common';
import type { ValidationError } from 'class-validator';

/**
 * Shapes a failed DTO validation as `{ statusCode: 400, message: [every sentence], errors: { field: first sentence } }`:
 * `message` stays the list Nest always gave, and `errors` lets a form put each sentence under its field.
 */
export function validationException(errors: ValidationError[]): BadRequestException {
  const messages: string[] = [];
  const byField: Record<string, string> = {};
  const walk = (list: ValidationError[], parent: string) => {
    for (const error of list) {
      const path = parent ? `${parent}.${error.property}` : error.property;
      const sentences = Object.values(error.constraints ?? {});
      messages.push(...sentences);
      if (sentences.length > 0 && !(path in byField)) byField[path] = sentences[0];
      if (error.children?.length) walk(error.children, path);
    }
  };
  walk(errors, '');
  return new BadRequestException({ message: messages, errors: byField, error: 'Bad Request' });
}
