import { useVirtualizer, type Virtualizer } from '@tanstack/react-virtual';
import { useCallback, useLayoutEffect, useRef, useState } from 'react';

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

export interface FollowingListOptions {
  /** How many rows the list has. */
  count: number;
  /** The row playing now, or -1 (nothing playing, or the list shows something else, such as search results). */
  currentIndex: number;
  /** A first guess at a row's height in px (for every row, or row by row); rows are measured once drawn. */
  estimateRowHeight: number | ((index: number) => number);
  /** Keys that stay with a row when the rows change (e.g. a cue's index in the whole transcript). */
  rowKey?: (index: number) => number;
  /** Where the playing row sits: a third of the way down, or near the top. */
  place: 'third' | 'top';
  /** Off while the scroller shows something other than these rows. */
  enabled?: boolean;
}

export interface FollowingList<T extends HTMLElement> {
  following: boolean;
  /** Ref for the scrolling box (a native scroller). */
  box: (node: T | null) => void;
  /** Draws only the rows in view: `getVirtualItems()`, `getTotalSize()`, `measureElement` for each row. */
  rows: Virtualizer<T, HTMLElement>;
  resume: () => void;
}

/** Rows drawn above and below the box, so a quick scroll does not show blank space. */
const OVERSCAN_ROWS = 8;
/** Jumps longer than this many box heights happen at once; a smooth scroll through hours of cues takes too long. */
const SMOOTH_JUMP_BOXES = 2;

/**
 * `useFollowPlayback` for long lists: only the rows in view are in the page (TanStack Virtual), so the playing
 * row may not exist as an element; the list scrolls to its index instead. Same rules: it follows until the
 * person scrolls the box, and `resume` follows again.
 */
export function useFollowingList<T extends HTMLElement>({
  count,
  currentIndex,
  estimateRowHeight,
  rowKey,
  place,
  enabled = true,
}: FollowingListOptions): FollowingList<T> {
  const [following, setFollowing] = useState(true);
  const followingNow = useRef(true);
  const boxNode = useRef<T | null>(null);
  const stopListening = useRef<(() => void) | null>(null);
  // The box's height, as the virtualizer last measured it: the "third of the way down" depends on it.
  const [boxHeight, setBoxHeight] = useState(0);
  const lead = place === 'third' ? Math.round(boxHeight / 3) : 16;

  // The studio is not built with React Compiler, so the virtualizer's changing methods are not memoised away.
  // eslint-disable-next-line react-hooks/incompatible-library
  const rows = useVirtualizer<T, HTMLElement>({
    count,
    getScrollElement: () => boxNode.current,
    estimateSize: typeof estimateRowHeight === 'number' ? () => estimateRowHeight : estimateRowHeight,
    getItemKey: rowKey,
    overscan: OVERSCAN_ROWS,
    scrollPaddingStart: lead,
    initialOffset: () => boxNode.current?.scrollTop ?? 0,
    enabled,
    onChange: (instance) => setBoxHeight(instance.scrollRect?.height ?? 0),
  });

  const stopFollowing = useCallback(() => {
    followingNow.current = false;
    setFollowing(false);
    rows.cancelScroll();
  }, [rows]);

  const box = useCallback(
    (node: T | null) => {
      stopListening.current?.();
      stopListening.current = null;
      boxNode.current = node;
      if (node) stopListening.current = listenForScrollingByHand(node, stopFollowing);
    },
    [stopFollowing],
  );

  const bringIntoView = useCallback(
    (index: number) => {
      if (index < 0 || index >= count || boxHeight === 0 || rows.getTotalSize() <= boxHeight) return;
      const row = rows.measurementsCache[index];
      const top = rows.scrollOffset ?? 0;
      if (!row || (row.start >= top && row.end <= top + boxHeight)) return;
      const far = Math.abs(row.start - top) > SMOOTH_JUMP_BOXES * boxHeight;
      rows.scrollToIndex(index, { align: 'start', behavior: far ? 'auto' : 'smooth' });
    },
    [rows, count, boxHeight],
  );

  // Layout effect: the box moves before the browser paints the new playing row.
  useLayoutEffect(() => {
    if (followingNow.current && enabled) bringIntoView(currentIndex);
  }, [currentIndex, enabled, bringIntoView]);

  const resume = useCallback(() => {
    followingNow.current = true;
    setFollowing(true);
    bringIntoView(currentIndex);
  }, [bringIntoView, currentIndex]);

  return { following, box, rows, resume };
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
