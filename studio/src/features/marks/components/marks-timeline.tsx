import { Group, Text } from '@mantine/core';
import { useRef, type MouseEvent } from 'react';
import { MARK_KINDS, type Mark } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { KindShape } from './kind-shape';
import { KIND_LOOK } from './mark-kinds';
import { placeMarks, timeAt } from './timeline-geometry';

const LANE_HEIGHT = 18;
const MARKER = 12;

export interface MarksTimelineProps {
  marks: Mark[];
  durationMs: number;
  currentMs: number;
  onSeek: (ms: number) => void;
}

/** The strip under the player: each mark as its kind's shape (spans as a bar), the playhead, a legend. */
export function MarksTimeline({ marks, durationMs, currentMs, onSeek }: MarksTimelineProps) {
  const strip = useRef<HTMLDivElement>(null);
  const { placed, lanes } = placeMarks(marks, durationMs);
  const byId = new Map(marks.map((mark) => [mark.id, mark]));
  const height = lanes * LANE_HEIGHT + 8;

  const handleStripClick = (event: MouseEvent<HTMLDivElement>) => {
    const box = strip.current?.getBoundingClientRect();
    if (box) onSeek(timeAt(event.clientX - box.left, box.width, durationMs));
  };

  return (
    <div>
      <div
        ref={strip}
        onClick={handleStripClick}
        data-testid="marks-timeline"
        role="group"
        aria-label="Marks along the footage"
        style={{ position: 'relative', height, background: 'var(--mantine-color-gray-1)', borderRadius: 6, cursor: 'pointer' }}
      >
        <div
          aria-hidden
          style={{
            position: 'absolute',
            left: `${Math.min(100, (currentMs / durationMs) * 100)}%`,
            top: 0,
            bottom: 0,
            width: 2,
            background: 'var(--mantine-color-red-7)',
          }}
        />
        {placed.map((item) => {
          const mark = byId.get(item.id);
          if (!mark) return null;
          const look = KIND_LOOK[mark.kind];
          const title = `${look.name} at ${formatClock(mark.startMs, { tenths: true })}${mark.label ? `: ${mark.label}` : ''}`;
          return (
            <button
              key={mark.id}
              type="button"
              title={title}
              aria-label={title}
              data-kind={mark.kind}
              onClick={(event) => {
                event.stopPropagation();
                onSeek(mark.startMs);
              }}
              style={{
                position: 'absolute',
                left: `calc(${item.x * 100}% - ${MARKER / 2}px)`,
                top: 4 + item.lane * LANE_HEIGHT,
                width: `calc(${item.width * 100}% + ${MARKER}px)`,
                height: MARKER + 2,
                padding: 0,
                border: 0,
                background: 'none',
                display: 'flex',
                alignItems: 'center',
                cursor: 'pointer',
              }}
            >
              <KindShape kind={mark.kind} size={MARKER} />
              {item.width > 0 && <span aria-hidden style={{ flex: 1, height: 3, background: look.color, opacity: 0.6 }} />}
            </button>
          );
        })}
      </div>
      <Group gap="md" mt={4}>
        {MARK_KINDS.map((kind) => (
          <Group key={kind} gap={4}>
            <KindShape kind={kind} size={10} />
            <Text size="xs" c="dimmed">
              {KIND_LOOK[kind].name}
            </Text>
          </Group>
        ))}
      </Group>
    </div>
  );
}
