import type { components } from './api-contract';

/** A shape of the API by its OpenAPI schema name, from the generated contract (`npm run contract`), never copied by hand. */
export type ApiSchema<Name extends keyof components['schemas']> = components['schemas'][Name];
