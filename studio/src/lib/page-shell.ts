import { useLayoutEffect } from 'react';

/**
 * The API draws a static shell of a public guide page into #root (title, cautions, poster: api/src/guides/
 * public-page-shell.ts) so it shows before the JavaScript. React would clear it at its first commit, which is a
 * blank layout while the route's code and the guide load; so the shell is moved out beside #root, and #root is
 * hidden, until the page's own view has something to show in its place.
 */
const SHELL = '[data-page-shell]';
/** However the page fares, the app shows itself after this long. */
const LONGEST_HOLD_MS = 15_000;

export function holdPageShell(root: HTMLElement): void {
  // The API sends the studio's stylesheets as print sheets after a shell, so they hold back no first paint.
  for (const link of document.querySelectorAll<HTMLLinkElement>('link[data-shell-deferred]')) link.media = 'all';
  const shell = root.querySelector(`:scope > ${SHELL}`);
  if (!shell) return;
  root.before(shell);
  root.hidden = true;
  setTimeout(releasePageShell, LONGEST_HOLD_MS);
}

/** Takes the shell away and shows the app (nothing to do when the page had no shell). */
export function releasePageShell(): void {
  const shell = document.querySelector(`body > ${SHELL}`);
  if (!shell) return;
  shell.remove();
  const root = document.getElementById('root');
  if (root) root.hidden = false;
}

/** Releases the shell once `ready`, or when the view goes away, (the view's data arrived, or it failed), in the commit that draws the view. */
export function useReleasePageShell(ready: boolean): void {
  useLayoutEffect(() => {
    if (ready) releasePageShell();
  }, [ready]);
  // A reader who leaves before the data came (another route) sees that route, not the shell.
  useLayoutEffect(() => releasePageShell, []);
}
