import { ActionIcon, Box, Kbd, TextInput } from '@mantine/core';
import { useEffect, useRef, useState, type FormEvent, type KeyboardEvent } from 'react';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';

/** True when a key press belongs to something the person is typing in, so "/" must stay a character there. */
export function isTypingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable) return true;
  return ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

export function searchPath(q: string): string {
  return `${paths.search}?${new URLSearchParams({ q }).toString()}`;
}

/**
 * The one search box in the header. "/" focuses it from anywhere except while typing in a field;
 * Escape leaves it; Enter opens the results page. On a phone the header shows a button to the
 * results page instead, which has its own box.
 */
export function HeaderSearch() {
  const navigate = useNavigate();
  const location = useLocation();
  const inputRef = useRef<HTMLInputElement>(null);
  const boxRef = useRef<HTMLDivElement>(null);
  const [value, setValue] = useState('');
  // On the results page the header box shows what was searched (adjusted while rendering, not in an effect).
  const searchedFor = location.pathname === paths.search ? (new URLSearchParams(location.search).get('q') ?? '') : null;
  const [shownFor, setShownFor] = useState<string | null>(null);
  if (searchedFor !== shownFor) {
    setShownFor(searchedFor);
    if (searchedFor !== null) setValue(searchedFor);
  }

  useEffect(() => {
    const handleKey = (event: globalThis.KeyboardEvent) => {
      if (event.key !== '/' || event.ctrlKey || event.metaKey || event.altKey || isTypingTarget(event.target)) return;
      const input = inputRef.current;
      event.preventDefault();
      // Hidden on a phone's narrow header: the results page has the box then.
      const hidden = !input || !boxRef.current || getComputedStyle(boxRef.current).display === 'none';
      if (hidden) navigate(paths.search);
      else input.focus();
    };
    document.addEventListener('keydown', handleKey);
    return () => document.removeEventListener('keydown', handleKey);
  }, [navigate]);

  const handleSubmit = (event: FormEvent) => {
    event.preventDefault();
    const q = value.trim();
    if (!q) return;
    inputRef.current?.blur();
    navigate(searchPath(q));
  };

  const handleKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'Escape') event.currentTarget.blur();
  };

  return (
    <>
      <Box ref={boxRef} visibleFrom="sm">
      <form role="search" onSubmit={handleSubmit} aria-label="Site search">
        <TextInput
          ref={inputRef}
          type="search"
          size="sm"
          w={{ sm: 220, md: 300 }}
          placeholder="Search guides, parts, transcripts"
          aria-label="Search guides, parts and transcripts (press / to focus)"
          value={value}
          onChange={(event) => setValue(event.currentTarget.value)}
          onKeyDown={handleKeyDown}
          rightSection={<Kbd size="xs">/</Kbd>}
          rightSectionPointerEvents="none"
          data-testid="header-search"
        />
      </form>
      </Box>
      <ActionIcon component={Link} to={paths.search} hiddenFrom="sm" variant="subtle" size="lg" aria-label="Search">
        <svg width="20" height="20" viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth="2" aria-hidden="true">
          <circle cx="11" cy="11" r="7" />
          <path d="m20 20-3.5-3.5" />
        </svg>
      </ActionIcon>
    </>
  );
}
