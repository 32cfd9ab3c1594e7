import { useCallback, useLayoutEffect, useRef } from 'react';

/**
 * A handler whose identity never changes but which always calls the latest `handler`: memoised rows can take it
 * without drawing again each time the parent passes a new function (a player's `seek`, say).
 */
export function useStableHandler<A extends unknown[]>(handler: (...args: A) => void): (...args: A) => void {
  const latest = useRef(handler);
  useLayoutEffect(() => {
    latest.current = handler;
  });
  return useCallback((...args: A) => latest.current(...args), []);
}
