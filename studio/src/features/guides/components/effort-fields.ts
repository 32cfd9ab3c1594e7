import { formatMinutes } from '@/lib/guide-effort';

/** Whole minutes from 1 to the limit, or empty: the rule the API applies, said before the request. */
export const checkMinutes =
  (max: number) =>
  (value: number | null): string | null => {
    if (value === null) return null;
    if (!Number.isInteger(value)) return 'Give whole minutes, e.g. 90';
    if (value < 1) return 'Give at least 1 minute, or leave it empty';
    return value > max ? `At most ${max} minutes (${formatMinutes(max)})` : null;
  };

/** Mantine's NumberInput gives '' when emptied; the API's "no estimate" is null. */
export const minutesFrom = (value: string | number): number | null => (typeof value === 'number' ? value : value.trim() === '' ? null : Number(value));
