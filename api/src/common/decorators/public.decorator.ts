import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'isPublic';

/** Marks a route as open to anyone, signed in or not. Every other route needs a rule. */
export const Public = () => SetMetadata(IS_PUBLIC, true);
