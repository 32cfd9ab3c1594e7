import { afterEach, describe, expect, it } from 'vitest';
import { holdPageShell, releasePageShell } from './page-shell';

describe('page shell', () => {
  afterEach(() => {
    document.body.innerHTML = '';
    document.head.innerHTML = '';
  });

  it('keeps the server’s shell in view, outside the root React clears, until released', () => {
    document.head.innerHTML = '<link rel="stylesheet" media="print" data-shell-deferred="" href="/a.css">';
    document.body.innerHTML = '<div id="root"><div data-page-shell=""><h1>Fitting the coupler</h1></div></div>';
    const root = document.getElementById('root')!;
    holdPageShell(root);
    expect(document.querySelector('link')?.media).toBe('all');
    expect(root.childElementCount).toBe(0);
    expect(root.hidden).toBe(true);
    expect(document.body.firstElementChild?.textContent).toBe('Fitting the coupler');
    releasePageShell();
    expect(document.querySelector('[data-page-shell]')).toBeNull();
    expect(root.hidden).toBe(false);
  });

  it('leaves a page without a shell alone', () => {
    document.body.innerHTML = '<div id="root"></div>';
    const root = document.getElementById('root')!;
    holdPageShell(root);
    expect(root.hidden).toBe(false);
    releasePageShell();
    expect(root.hidden).toBe(false);
  });
});
