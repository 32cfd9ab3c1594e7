import { useId, type ReactNode } from 'react';
import { DiagramPatterns, patternIds, type PatternIds } from './diagram-patterns';

/** Below this width the labels would shrink out of reading; the frame scrolls sideways instead. */
const MIN_WIDTH = 480;

export interface DiagramFrameProps {
  /** Short prefix making this picture's pattern ids unique on the page. */
  idPrefix: string;
  width: number;
  height: number;
  title: ReactNode;
  description: string;
  testId: string;
  /** The drawing, given the ids of the fill patterns it may use. */
  children: (ids: PatternIds) => ReactNode;
}

/**
 * What every diagram shares: an `<svg role="img">` named by its `<title>` and `<desc>` (so it reads
 * without sight), the fill patterns (so it reads without colour), and a wrapper that keeps a readable
 * size on a narrow screen by scrolling sideways.
 */
export function DiagramFrame({ idPrefix, width, height, title, description, testId, children }: DiagramFrameProps) {
  const id = useId();
  const ids = patternIds(`${idPrefix}${id}`);
  const titleId = `${ids.hatch}-title`;
  const descId = `${ids.hatch}-desc`;
  return (
    <div style={{ overflowX: 'auto', maxWidth: '100%' }}>
      <svg
        viewBox={`0 0 ${width} ${height}`}
        width="100%"
        style={{ maxWidth: width, minWidth: MIN_WIDTH, display: 'block', fontFamily: 'inherit' }}
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        data-testid={testId}
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{description}</desc>
        <DiagramPatterns ids={ids} />
        {children(ids)}
      </svg>
    </div>
  );
}
