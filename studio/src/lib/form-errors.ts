import { ApiError } from './api-client';

export interface SplitErrors {
  /** Messages that name one of the form's fields, keyed by that field. */
  fields: Record<string, string>;
  /** Everything else (a conflict, a rule spanning fields), to show above the form. */
  general: string[];
}

/**
 * Spreads an API error over a form. The API's validation messages start with the field they are
 * about ("teeth must be a whole number", "nominal: cannot read …"), so each can sit under its
 * input, with the field's label in place of its wire name; a message that names no field of this
 * form is shown once for the whole form.
 */
export function splitApiErrors(error: unknown, labels: Readonly<Record<string, string>>): SplitErrors {
  const result: SplitErrors = { fields: {}, general: [] };
  if (!(error instanceof ApiError)) {
    result.general.push(error instanceof Error ? error.message : 'Something went wrong.');
    return result;
  }
  const body = (typeof error.body === 'object' && error.body !== null ? error.body : {}) as { message?: unknown; errors?: unknown };
  const messages = Array.isArray(body.message)
    ? body.message.filter((item): item is string => typeof item === 'string')
    : typeof body.message === 'string'
      ? [body.message]
      : [error.message];
  // A failed DTO validation names each field in `errors`; the service's own 400s only in the sentence.
  const byField = typeof body.errors === 'object' && body.errors !== null ? (body.errors as Record<string, unknown>) : {};
  const placed = new Set<string>();
  for (const [field, sentence] of Object.entries(byField)) {
    if (typeof sentence !== 'string' || !(field in labels)) continue;
    result.fields[field] = withLabel(sentence, field, labels[field]);
    placed.add(sentence);
  }
  for (const message of messages) {
    if (placed.has(message)) continue;
    const field = Object.keys(labels).find((name) => new RegExp(`^${name}(\\s|:)`).test(message));
    // A second sentence about a field that already shows one stays out of the way.
    if (field) result.fields[field] ??= withLabel(message, field, labels[field]);
    else result.general.push(message);
  }
  return result;
}

/** "nominal: cannot read …" → "Nominal: cannot read …"; "teeth must be …" → "Teeth must be …". */
function withLabel(message: string, field: string, label: string): string {
  return message.startsWith(field) ? `${label}${message.slice(field.length)}` : message;
}
