import { useEffect } from 'react';

/**
 * The marking workspace's keys, chosen for one hand on the keyboard while the other holds the mouse:
 * M pins a mark at the playing moment; ? (Shift+/) shows this list. Typing in a field never triggers them.
 */
export const MARKING_SHORTCUTS = [
  { key: 'M', action: 'pin', description: 'Pin a mark at the playing moment' },
  { key: '?', action: 'help', description: 'Show these keys' },
] as const;
export type ShortcutAction = (typeof MARKING_SHORTCUTS)[number]['action'];

export interface KeyLike {
  key: string;
  ctrlKey: boolean;
  metaKey: boolean;
  altKey: boolean;
  target: EventTarget | null;
}

function isTyping(target: EventTarget | null): boolean {
  if (!target || typeof (target as Partial<HTMLElement>).tagName !== 'string') return false;
  const element = target as HTMLElement;
  return element.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(element.tagName);
}

export function shortcutFor(event: KeyLike): ShortcutAction | null {
  if (event.ctrlKey || event.metaKey || event.altKey || isTyping(event.target)) return null;
  if (event.key === 'm' || event.key === 'M') return 'pin';
  if (event.key === '?') return 'help';
  return null;
}

/** Listens on the document while `enabled` (off while a dialog is open, so its fields keep their keys). */
export function useMarkingShortcuts(enabled: boolean, handlers: Record<ShortcutAction, () => void>): void {
  useEffect(() => {
    if (!enabled) return undefined;
    const handleKeyDown = (event: KeyboardEvent) => {
      const action = shortcutFor(event);
      if (!action) return;
      event.preventDefault();
      handlers[action]();
    };
    document.addEventListener('keydown', handleKeyDown);
    return () => document.removeEventListener('keydown', handleKeyDown);
  }, [enabled, handlers]);
}
