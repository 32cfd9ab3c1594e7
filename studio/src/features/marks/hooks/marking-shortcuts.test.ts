import { describe, expect, it } from 'vitest';
import { shortcutFor } from './marking-shortcuts';

const press = (key: string, extra: Partial<{ ctrlKey: boolean; metaKey: boolean; altKey: boolean; target: EventTarget | null }> = {}) => ({
  key,
  ctrlKey: false,
  metaKey: false,
  altKey: false,
  target: document.body,
  ...extra,
});

describe('marking shortcuts', () => {
  it('pins with M (either case) and opens the key list with ?', () => {
    expect(shortcutFor(press('m'))).toBe('pin');
    expect(shortcutFor(press('M'))).toBe('pin');
    expect(shortcutFor(press('?'))).toBe('help');
    expect(shortcutFor(press('k'))).toBeNull();
  });

  it('leaves browser shortcuts and typing alone', () => {
    expect(shortcutFor(press('m', { ctrlKey: true }))).toBeNull();
    expect(shortcutFor(press('m', { metaKey: true }))).toBeNull();
    expect(shortcutFor(press('m', { target: document.createElement('input') }))).toBeNull();
    expect(shortcutFor(press('m', { target: document.createElement('textarea') }))).toBeNull();
  });
});
