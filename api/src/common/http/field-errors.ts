import { NotFoundException } from '@nestjs/common';

/**
 * A referenced id (in a body or query) that names nothing in the caller's workshop: 404, the same answer
 * for "exists elsewhere" and "never existed", with the field named for forms (`errors: { field: sentence }`).
 */
export function referenceNotFound(field: string, thing: string): NotFoundException {
  return new NotFoundException({
    message: `${thing} not found`,
    errors: { [field]: `No such ${thing.toLowerCase()} in this workshop` },
    code: 'reference_not_found',
  });
}
