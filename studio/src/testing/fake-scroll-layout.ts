import { vi } from 'vitest';

/**
 * jsdom does not lay out. For lists that draw only the rows in view, this gives every element a height and the
 * scrolling boxes a real scroll position: `scrollTo` moves `scrollTop` (kept within the content, as browsers do)
 * and fires `scroll` on the next tick, as browsers do; each move is recorded. A box's content height is the inline
 * height of its first child (the virtual list's spacer). Call in `beforeEach`; `vi.restoreAllMocks()` undoes it.
 */
export function fakeScrollLayout({ boxHeight, rowHeight }: { boxHeight: number; rowHeight: number }) {
  const positions = new WeakMap<Element, number>();
  const moves: number[] = [];
  const inlineHeight = (element: Element | null) => {
    const height = element instanceof HTMLElement ? Number.parseFloat(element.style.height) : Number.NaN;
    return Number.isFinite(height) ? height : null;
  };
  // A box is what holds a spacer; the spacer is as tall as its inline style says; anything else is a row.
  const contentHeight = (element: Element) => inlineHeight(element.firstElementChild) ?? 0;
  const clientHeight = (element: Element) => {
    if (inlineHeight(element.firstElementChild) !== null) return Math.min(contentHeight(element), boxHeight);
    return inlineHeight(element) ?? rowHeight;
  };
  const maxTop = (element: Element) => Math.max(0, contentHeight(element) - clientHeight(element));

  vi.spyOn(HTMLElement.prototype, 'clientHeight', 'get').mockImplementation(function getClientHeight(this: HTMLElement) {
    return clientHeight(this);
  });
  vi.spyOn(HTMLElement.prototype, 'offsetHeight', 'get').mockImplementation(function getOffsetHeight(this: HTMLElement) {
    return clientHeight(this);
  });
  vi.spyOn(HTMLElement.prototype, 'scrollHeight', 'get').mockImplementation(function getScrollHeight(this: HTMLElement) {
    return Math.max(contentHeight(this), clientHeight(this));
  });
  vi.spyOn(Element.prototype, 'scrollTop', 'get').mockImplementation(function getScrollTop(this: Element) {
    return positions.get(this) ?? 0;
  });
  const scrollTo = (element: Element, top: number) => {
    const next = Math.min(Math.max(0, Math.round(top)), maxTop(element));
    if (next === (positions.get(element) ?? 0)) return;
    positions.set(element, next);
    moves.push(next);
    setTimeout(() => element.dispatchEvent(new Event('scroll')), 0);
  };
  Element.prototype.scrollTo = vi.fn(function fakeScrollTo(this: Element, options?: ScrollToOptions | number) {
    if (typeof options === 'object' && options.top !== undefined) scrollTo(this, options.top);
  }) as typeof Element.prototype.scrollTo;

  return {
    /** Every change of a box's scroll position, in px from its top. */
    moves,
    /** The person turns the wheel over the box, moving it to `top` (a scroll the list did not ask for; not in `moves`). */
    scrollByHand(box: Element, top: number) {
      box.dispatchEvent(new WheelEvent('wheel', { bubbles: true }));
      const before = moves.length;
      scrollTo(box, top);
      moves.length = before;
    },
  };
}
