import { randomUUID } from 'node:crypto';
import { ValueTransformer } from 'typeorm';

/** UUID primary keys are made in the app, so an entity knows its id before it is saved. */
export const newId = (): string => randomUUID();

/** BIGINT nanometre columns come back from mysql2 as strings (bigNumberStrings); lengths fit a safe integer. */
export const nanometresTransformer: ValueTransformer = {
  to: (value: number | null | undefined) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};

/** DECIMAL columns come back as strings too. */
export const decimalTransformer: ValueTransformer = {
  to: (value: number | null | undefined) => value,
  from: (value: string | null) => (value === null ? null : Number(value)),
};
