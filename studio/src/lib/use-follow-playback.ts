import { useCallback, useRef, useState } from 'react';

/** Keys that scroll a focused list. */
const SCROLL_KEYS = new Set(['ArrowUp', 'ArrowDown', 'PageUp', 'PageDown', 'Home', 'End', ' ']);

export interface FollowPlayback<T extends HTMLElement> {
  /** True while the list keeps the playing row in view. */
  following: boolean;
  /** Ref for the scrolling box (a native scroller, or a Mantine ScrollArea's viewport). */
  box: (node: T | null) => void;
  /** Ref for the row playing now. */
  currentRow: (node: HTMLElement | null) => void;
  /** Follow again from the playing row ("Back to now"). */
  resume: () => void;
}

/**
 * A list beside the video keeps the playing row in view, until the person scrolls it themselves (wheel,
 * touch, keys or the scrollbar): then it stays where they put it, and `resume` brings it back. Only the
 * box scrolls, never the page. `place` puts the playing row a third of the way down, or near the top.
 */
export function useFollowPlayback<T extends HTMLElement>(place: 'third' | 'top'): FollowPlayback<T> {
  const [following, setFollowing] = useState(true);
  const followingNow = useRef(true);
  const boxNode = useRef<T | null>(null);
  const rowNode = useRef<HTMLElement | null>(null);
  const stopListening = useRef<(() => void) | null>(null);

  const stopFollowing = useCallback(() => {
    followingNow.current = false;
    setFollowing(false);
  }, []);

  const box = useCallback(
    (node: T | null) => {
      stopListening.current?.();
      stopListening.current = null;
      boxNode.current = node;
      if (!node) return;
      stopListening.current = listenForScrollingByHand(node, stopFollowing);
      // React attaches a row's ref before its box's: the first placement happens here.
      if (rowNode.current && followingNow.current) keepInView(node, rowNode.current, place);
    },
    [stopFollowing, place],
  );

  const currentRow = useCallback(
    (node: HTMLElement | null) => {
      rowNode.current = node;
      if (node && boxNode.current && followingNow.current) keepInView(boxNode.current, node, place);
    },
    [place],
  );

  const resume = useCallback(() => {
    followingNow.current = true;
    setFollowing(true);
    if (boxNode.current && rowNode.current) keepInView(boxNode.current, rowNode.current, place);
  }, [place]);

  return { following, box, currentRow, resume };
}

function keepInView(box: HTMLElement, row: HTMLElement, place: 'third' | 'top'): void {
  if (box.scrollHeight <= box.clientHeight) return;
  const top = row.offsetTop - box.offsetTop;
  if (top < box.scrollTop || top + row.offsetHeight > box.scrollTop + box.clientHeight) {
    const lead = place === 'third' ? box.clientHeight / 3 : 16;
    box.scrollTo({ top: Math.max(0, top - lead), behavior: 'smooth' });
  }
}

/** Scrolling the player does is programmatic; these are the signs of a person scrolling. */
function listenForScrollingByHand(box: HTMLElement, onScroll: () => void): () => void {
  const onKey = (event: KeyboardEvent) => {
    if (SCROLL_KEYS.has(event.key) && !(event.target instanceof HTMLInputElement)) onScroll();
  };
  // A native scrollbar is the box itself; a Mantine ScrollArea's bar sits beside its viewport.
  const scrollbarRoot = box.parentElement ?? box;
  const onPointer = (event: PointerEvent) => {
    const target = event.target instanceof Element ? event.target : null;
    if (target === box || target?.closest('.mantine-ScrollArea-scrollbar')) onScroll();
  };
  box.addEventListener('wheel', onScroll, { passive: true });
  box.addEventListener('touchmove', onScroll, { passive: true });
  box.addEventListener('keydown', onKey);
  scrollbarRoot.addEventListener('pointerdown', onPointer);
  return () => {
    box.removeEventListener('wheel', onScroll);
    box.removeEventListener('touchmove', onScroll);
    box.removeEventListener('keydown', onKey);
    scrollbarRoot.removeEventListener('pointerdown', onPointer);
  };
}
