import { ArgumentMetadata, BadRequestException, Injectable, PipeTransform } from '@nestjs/common';

/**
 * One rule for all text the API accepts: C0 control characters and DEL are refused, except tab, line feed
 * and carriage return. A NUL or an escape sequence in a title breaks exports, terminals and e-mails, and
 * silently stripping it would store something other than what was sent.
 */
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

/** The path (`features[0].name`) of the first string, or key, holding a forbidden character; undefined when none. */
export function findControlCharacter(value: unknown, path = ''): string | undefined {
  if (typeof value === 'string') return FORBIDDEN.test(value) ? path || 'value' : undefined;
  if (Array.isArray(value)) {
    for (const [index, item] of value.entries()) {
      const found = findControlCharacter(item, `${path}[${index}]`);
      if (found) return found;
    }
    return undefined;
  }
  if (value !== null && typeof value === 'object' && !Buffer.isBuffer(value)) {
    for (const [key, item] of Object.entries(value)) {
      const keyPath = path ? `${path}.${key}` : key;
      if (FORBIDDEN.test(key)) return keyPath;
      const found = findControlCharacter(item, keyPath);
      if (found) return found;
    }
  }
  return undefined;
}

/** Global pipe applying the rule above to bodies, query strings and route parameters, naming the field. */
@Injectable()
export class RejectControlCharactersPipe implements PipeTransform {
  transform(value: unknown, metadata: ArgumentMetadata): unknown {
    if (metadata.type === 'custom') return value;
    const found = findControlCharacter(value, metadata.type === 'body' ? '' : (metadata.data ?? ''));
    if (found === undefined) return value;
    const sentence = `${found} contains a control character (such as NUL); only tab and line breaks are allowed in text`;
    return this.refuse(found, sentence);
  }

  private refuse(field: string, sentence: string): never {
    throw new BadRequestException({ message: [sentence], errors: { [field]: sentence }, error: 'Bad Request', code: 'control_character' });
  }
}
