import { Transform } from 'class-transformer';

/** A plain decimal as a query string carries it: "25", "-3", "0.5". Bounded, so the test runs in linear time. */
const DECIMAL_TEXT = /^-?\d{1,16}(\.\d{1,16})?$/;

/**
 * For query-string numbers only: turns decimal text into a number and leaves anything else as it came
 * ("", "abc", "1e999", arrays), so `@IsInt()`/`@IsNumber()` refuse it naming the field. Unlike
 * `@Type(() => Number)` it never turns `""` into 0 or `true` into 1. JSON bodies need no conversion
 * and must not use it: there a string, or a boolean, where a number belongs is an error.
 */
export const NumberFromText = () =>
  Transform(({ value }: { value: unknown }) => (typeof value === 'string' && DECIMAL_TEXT.test(value) ? Number(value) : value));
