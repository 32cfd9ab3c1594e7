import { randomUUID } from 'node:crypto';
import { CreateDateColumn, UpdateDateColumn, ValueTransformer } from 'typeorm';

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

/** created_at DATETIME(3), set by the database; the default matches the migrations so schema checks see no drift. */
export const CreatedAtColumn = () =>
  CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' });

/** updated_at DATETIME(3), set by the database on every change. */
export const UpdatedAtColumn = () =>
  UpdateDateColumn({
    name: 'updated_at',
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  });
