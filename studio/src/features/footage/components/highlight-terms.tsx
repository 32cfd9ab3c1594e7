import { Highlight } from '@mantine/core';

/** Cue text with the searched words (and longer words they start) highlighted. */
export function HighlightTerms({ text, terms }: { text: string; terms: string[] }) {
  return (
    <Highlight size="sm" highlight={terms} component="span">
      {text}
    </Highlight>
  );
}
