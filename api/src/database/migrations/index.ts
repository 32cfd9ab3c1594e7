import { MixedList } from 'typeorm';

/** Every migration, oldest first. Listed explicitly so the same list works from src (tests) and dist. */
// eslint-disable-next-line @typescript-eslint/no-unsafe-function-type
export const migrations: MixedList<Function> = [];
