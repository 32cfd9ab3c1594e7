import { Text } from '@mantine/core';
import type { SnippetSegment } from '../api/types';

/** A hit's words with the matched ones marked. Segments are drawn as text, so nothing in a hit becomes markup. */
export function Snippet({ segments }: { segments: SnippetSegment[] }) {
  if (segments.length === 0) return null;
  return (
    <Text size="sm" data-testid="search-snippet">
      {segments.map((segment, index) => (segment.match ? <mark key={index}>{segment.text}</mark> : <span key={index}>{segment.text}</span>))}
    </Text>
  );
}
