import type { MarkKind } from '../api/queries';
import { KIND_LOOK } from './mark-kinds';

/** A kind's shape as a small inline icon, named for screen readers. */
export function KindShape({ kind, size = 12 }: { kind: MarkKind; size?: number }) {
  const look = KIND_LOOK[kind];
  return (
    <svg width={size} height={size} viewBox="0 0 12 12" role="img" aria-label={look.name} style={{ flex: 'none' }}>
      <path d={look.shape} fill={look.color} />
    </svg>
  );
}
