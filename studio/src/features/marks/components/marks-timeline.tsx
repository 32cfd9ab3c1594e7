import { ActionIcon, Group, Text, Tooltip } from '@mantine/core';
import { memo, useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent, type ReactNode } from 'react';
import { MARK_KINDS, type Mark } from '../api/queries';
import { formatClock } from '@/lib/clock';
import { usePlaybackSelect, type PlaybackClock } from '@/lib/playback-clock';
import { useStableHandler } from '@/lib/use-stable-handler';
import { KindShape } from './kind-shape';
import { KIND_LOOK } from './mark-kinds';
import {
  centreView,
  clusterMarks,
  followPlayhead,
  hitDensity,
  panView,
  positionOf,
  timeAt,
  viewOfCluster,
  wholeView,
  zoomView,
  type MarkCluster,
  type TimelineView,
} from './timeline-geometry';

const MARKER = 12;
const STRIP_HEIGHT = 30;
const DENSITY_HEIGHT = 12;
const MINIMAP_HEIGHT = 14;
/** The minimap's ticks are drawn in a box this many units wide, stretched to the bar. */
const MINIMAP_TICK_SPAN = 1_000;
/** One density column every few pixels: fine enough to show where hits gather, few enough to draw cheaply. */
const DENSITY_COLUMN_PX = 4;
/** One wheel notch towards the screen (about 100 px of delta) zooms in by this factor. */
const WHEEL_ZOOM_PER_100PX = 0.8;
const KEY_ZOOM = 0.5;
const KEY_PAN = 0.25;

export interface MarksTimelineProps {
  marks: Mark[];
  durationMs: number;
  /** Where the video is: the playhead subscribes; the strip re-renders only when the view must turn to follow it. */
  clock: PlaybackClock;
  onSeek: (ms: number) => void;
  /** Start times of the transcript search hits, drawn as a density band over the strip. */
  hitStartsMs?: readonly number[];
  /** Lanes under the marks that follow the same zoom (e.g. the audio waveform), given the stretch in view. */
  renderLanes?: (view: TimelineView) => ReactNode;
  /** Shown above the pointer while it hovers the strip (e.g. a scrub preview frame), given the time under it. */
  renderHoverPreview?: (atMs: number) => ReactNode;
}

/** A ref for the strip that keeps its width in px current as the layout changes (React 19 ref cleanup). */
function useMeasuredStrip(): { strip: HTMLDivElement | null; width: number; ref: (node: HTMLDivElement | null) => () => void } {
  const [strip, setStrip] = useState<HTMLDivElement | null>(null);
  const [width, setWidth] = useState(0);
  const ref = useCallback((node: HTMLDivElement | null) => {
    setStrip(node);
    if (!node) return () => {};
    setWidth(node.clientWidth);
    const observer = new ResizeObserver(() => setWidth(node.clientWidth));
    observer.observe(node);
    return () => observer.disconnect();
  }, []);
  return { strip, width, ref };
}

/**
 * The marking timeline: the whole footage at a glance with nearby marks gathered into numbered clusters (one row,
 * never stacked lanes); zoom down to seconds with the wheel, the + and − keys or the buttons, pan with the arrow
 * keys, a sideways wheel or the minimap below; search hits shown as a density band. Only what is in view is drawn,
 * and a time update moves the playhead alone.
 */
export function MarksTimeline({ marks, durationMs, clock, onSeek, hitStartsMs, renderLanes, renderHoverPreview }: MarksTimelineProps) {
  const { strip, width, ref: stripRef } = useMeasuredStrip();
  const [view, setView] = useState<TimelineView>(() => wholeView(durationMs));
  const [hoverMs, setHoverMs] = useState<number | null>(null);
  // The view follows the playhead as it moves. Listening to the clock here (not reading it while rendering) means a
  // time update re-renders the strip only when the view turns a page; otherwise only the playhead moves.
  const viewRef = useRef(view);
  useLayoutEffect(() => {
    viewRef.current = view;
  }, [view]);
  useEffect(() => {
    let previousMs = clock.getMs();
    return clock.subscribe(() => {
      const currentMs = clock.getMs();
      const next = followPlayhead(viewRef.current, previousMs, currentMs, durationMs);
      previousMs = currentMs;
      if (next !== viewRef.current) {
        viewRef.current = next;
        setView(next);
      }
    });
  }, [clock, durationMs]);

  // React's wheel listener is passive; zooming must stop the page from scrolling, so listen natively.
  useEffect(() => {
    if (!strip) return undefined;
    const handleWheel = (event: WheelEvent) => {
      event.preventDefault();
      const box = strip.getBoundingClientRect();
      const sideways = Math.abs(event.deltaX) > Math.abs(event.deltaY) || event.shiftKey;
      if (sideways) {
        const delta = event.shiftKey && event.deltaX === 0 ? event.deltaY : event.deltaX;
        setView((current) => panView(current, delta / Math.max(box.width, 1), durationMs));
        return;
      }
      const anchor = box.width > 0 ? (event.clientX - box.left) / box.width : 0.5;
      setView((current) => zoomView(current, WHEEL_ZOOM_PER_100PX ** (-event.deltaY / 100), anchor, durationMs));
    };
    strip.addEventListener('wheel', handleWheel, { passive: false });
    return () => strip.removeEventListener('wheel', handleWheel);
  }, [strip, durationMs]);

  const clusters = useMemo(() => clusterMarks(marks, view, width), [marks, view, width]);
  const byId = useMemo(() => new Map(marks.map((mark) => [mark.id, mark])), [marks]);
  const density = useMemo(
    () => (hitStartsMs && hitStartsMs.length > 0 ? hitDensity(hitStartsMs, view, Math.floor(width / DENSITY_COLUMN_PX)) : null),
    [hitStartsMs, view, width],
  );
  const whole = view.startMs <= 0 && view.endMs >= durationMs;

  // Zooming by key or button keeps the playhead where it is, if it is in view; otherwise the middle.
  const zoomAroundPlayhead = (factor: number) =>
    setView((current) => {
      const anchor = positionOf(clock.getMs(), current);
      return zoomView(current, factor, anchor >= 0 && anchor <= 1 ? anchor : 0.5, durationMs);
    });
  const handleSeek = useStableHandler(onSeek);
  const handleOpenCluster = useStableHandler((cluster: MarkCluster) => setView(viewOfCluster(cluster, durationMs)));

  const handleKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.ctrlKey || event.metaKey || event.altKey) return;
    const actions: Record<string, () => void> = {
      '+': () => zoomAroundPlayhead(KEY_ZOOM),
      '=': () => zoomAroundPlayhead(KEY_ZOOM),
      '-': () => zoomAroundPlayhead(1 / KEY_ZOOM),
      '0': () => setView(wholeView(durationMs)),
      ArrowLeft: () => setView((current) => panView(current, -KEY_PAN, durationMs)),
      ArrowRight: () => setView((current) => panView(current, KEY_PAN, durationMs)),
    };
    const action = actions[event.key];
    if (!action) return;
    event.preventDefault();
    action();
  };

  const handleStripClick = (event: PointerEvent<HTMLDivElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    onSeek(timeAt(event.clientX - box.left, box.width, view));
  };
  const handleHover = (event: PointerEvent<HTMLDivElement>) => {
    if (!renderHoverPreview) return;
    const box = event.currentTarget.getBoundingClientRect();
    setHoverMs(timeAt(event.clientX - box.left, box.width, view));
  };

  return (
    <div>
      <Group justify="space-between" gap="xs" mb={4}>
        <Text size="xs" c="dimmed" data-testid="timeline-range">
          {whole ? `Whole footage, ${formatClock(durationMs)}` : `${formatClock(view.startMs, { tenths: true })} – ${formatClock(view.endMs, { tenths: true })}`}
        </Text>
        <Group gap={4}>
          <Tooltip label="Zoom in (+)">
            <ActionIcon size="sm" variant="default" aria-label="Zoom in" onClick={() => zoomAroundPlayhead(KEY_ZOOM)}>
              +
            </ActionIcon>
          </Tooltip>
          <Tooltip label="Zoom out (−)">
            <ActionIcon size="sm" variant="default" aria-label="Zoom out" disabled={whole} onClick={() => zoomAroundPlayhead(1 / KEY_ZOOM)}>
              −
            </ActionIcon>
          </Tooltip>
          <Tooltip label="Whole footage (0)">
            <ActionIcon size="sm" variant="default" aria-label="Show the whole footage" disabled={whole} onClick={() => setView(wholeView(durationMs))}>
              ↔
            </ActionIcon>
          </Tooltip>
        </Group>
      </Group>
      <div
        ref={stripRef}
        onClick={handleStripClick}
        onPointerMove={handleHover}
        onPointerLeave={() => setHoverMs(null)}
        onKeyDown={handleKeyDown}
        tabIndex={0}
        data-testid="marks-timeline"
        role="group"
        aria-label="Marks along the footage: wheel or + and − to zoom, arrow keys to move along"
        style={{
          position: 'relative',
          height: STRIP_HEIGHT + (density ? DENSITY_HEIGHT : 0),
          background: 'var(--mantine-color-gray-1)',
          borderRadius: 6,
          cursor: 'pointer',
          overflow: 'hidden',
          touchAction: 'pan-y',
        }}
      >
        {density && <DensityBand counts={density} />}
        <MarkerLayer clusters={clusters} byId={byId} top={density ? DENSITY_HEIGHT : 0} onSeek={handleSeek} onOpenCluster={handleOpenCluster} />
        <Playhead clock={clock} view={view} />
        {hoverMs !== null && renderHoverPreview && (
          <div style={{ position: 'absolute', left: `${positionOf(hoverMs, view) * 100}%`, bottom: '100%', transform: 'translateX(-50%)', pointerEvents: 'none', zIndex: 2 }}>
            {renderHoverPreview(hoverMs)}
          </div>
        )}
      </div>
      {renderLanes?.(view)}
      <Minimap marks={marks} durationMs={durationMs} view={view} clock={clock} onCentre={(ms) => setView((current) => centreView(current, ms, durationMs))} />
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

/** The red line at the playing moment: the one part of the strip that re-renders on a time update. */
function Playhead({ clock, view }: { clock: PlaybackClock; view: TimelineView }) {
  const at = usePlaybackSelect(clock, (ms) => positionOf(ms, view));
  if (at < 0 || at > 1) return null;
  return (
    <div
      aria-hidden
      data-testid="timeline-playhead"
      style={{ position: 'absolute', left: `${at * 100}%`, top: 0, bottom: 0, width: 2, background: 'var(--mantine-color-red-7)', pointerEvents: 'none' }}
    />
  );
}

interface MarkerLayerProps {
  clusters: MarkCluster[];
  byId: Map<string, Mark>;
  top: number;
  onSeek: (ms: number) => void;
  onOpenCluster: (cluster: MarkCluster) => void;
}

/** The markers in view; memoised so the playhead moving never draws them again. */
const MarkerLayer = memo(function MarkerLayer({ clusters, byId, top, onSeek, onOpenCluster }: MarkerLayerProps) {
  return (
    <>
      {clusters.map((cluster) => {
        const first = byId.get(cluster.ids[0]);
        if (!first) return null;
        if (cluster.ids.length > 1) {
          const title = `${cluster.ids.length} marks from ${formatClock(cluster.startMs, { tenths: true })} to ${formatClock(cluster.endMs, { tenths: true })}: zoom in`;
          return (
            <button
              key={cluster.ids[0]}
              type="button"
              title={title}
              aria-label={title}
              data-testid="timeline-cluster"
              onClick={(event) => {
                event.stopPropagation();
                onOpenCluster(cluster);
              }}
              style={{
                position: 'absolute',
                left: `calc(${cluster.x * 100}% - 9px)`,
                top: top + 6,
                minWidth: 18,
                height: 18,
                padding: '0 4px',
                border: '1px solid var(--mantine-color-gray-6)',
                borderRadius: 9,
                background: 'var(--mantine-color-body)',
                fontSize: 11,
                lineHeight: '16px',
                cursor: 'zoom-in',
              }}
            >
              {cluster.ids.length}
            </button>
          );
        }
        const look = KIND_LOOK[first.kind];
        const title = `${look.name} at ${formatClock(first.startMs, { tenths: true })}${first.label ? `: ${first.label}` : ''}`;
        return (
          <button
            key={first.id}
            type="button"
            title={title}
            aria-label={title}
            data-kind={first.kind}
            onClick={(event) => {
              event.stopPropagation();
              onSeek(first.startMs);
            }}
            style={{
              position: 'absolute',
              left: `calc(${cluster.x * 100}% - ${MARKER / 2}px)`,
              top: top + 8,
              width: `calc(${cluster.width * 100}% + ${MARKER}px)`,
              height: MARKER + 2,
              padding: 0,
              border: 0,
              background: 'none',
              display: 'flex',
              alignItems: 'center',
              cursor: 'pointer',
            }}
          >
            <KindShape kind={first.kind} size={MARKER} />
            {cluster.width > 0 && <span aria-hidden style={{ flex: 1, height: 3, background: look.color, opacity: 0.6 }} />}
          </button>
        );
      })}
    </>
  );
});

/** Where the search hits gather in view: one bar per column, as tall as its share of the busiest column. */
const DensityBand = memo(function DensityBand({ counts }: { counts: number[] }) {
  const busiest = Math.max(1, ...counts);
  const total = counts.reduce((sum, count) => sum + count, 0);
  return (
    <svg
      data-testid="hit-density"
      role="img"
      aria-label={`${total} search hits in view`}
      width="100%"
      height={DENSITY_HEIGHT}
      viewBox={`0 0 ${counts.length} ${DENSITY_HEIGHT}`}
      preserveAspectRatio="none"
      style={{ position: 'absolute', left: 0, top: 0, display: 'block' }}
    >
      {counts.map((count, column) => {
        if (count === 0) return null;
        const height = Math.max(2, (count / busiest) * DENSITY_HEIGHT);
        return <rect key={column} x={column} y={DENSITY_HEIGHT - height} width={1} height={height} fill="var(--mantine-color-yellow-6)" />;
      })}
    </svg>
  );
});

interface MinimapProps {
  marks: Mark[];
  durationMs: number;
  view: TimelineView;
  clock: PlaybackClock;
  onCentre: (ms: number) => void;
}

/** The whole footage in a thin bar with the stretch in view outlined; press or drag on it to move the view there. */
function Minimap({ marks, durationMs, view, clock, onCentre }: MinimapProps) {
  const whole = useMemo(() => wholeView(durationMs), [durationMs]);
  const ticks = useMemo(() => clusterMarks(marks, whole, 1_000, 2), [marks, whole]);
  const dragging = useRef(false);
  const centreAt = (event: PointerEvent<HTMLDivElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    onCentre(timeAt(event.clientX - box.left, box.width, whole));
  };
  const left = positionOf(view.startMs, whole);
  const right = positionOf(view.endMs, whole);
  return (
    <div
      data-testid="timeline-minimap"
      aria-hidden
      onPointerDown={(event) => {
        dragging.current = true;
        event.currentTarget.setPointerCapture?.(event.pointerId);
        centreAt(event);
      }}
      onPointerMove={(event) => dragging.current && centreAt(event)}
      onPointerUp={() => {
        dragging.current = false;
      }}
      style={{ position: 'relative', height: MINIMAP_HEIGHT, marginTop: 4, background: 'var(--mantine-color-gray-0)', borderRadius: 4, cursor: 'grab', touchAction: 'none' }}
    >
      <MinimapTicks ticks={ticks} />
      <span
        data-testid="timeline-minimap-view"
        style={{
          position: 'absolute',
          left: `${left * 100}%`,
          width: `max(${(right - left) * 100}%, 3px)`,
          top: 0,
          bottom: 0,
          border: '2px solid var(--mantine-color-blue-6)',
          borderRadius: 4,
          boxSizing: 'border-box',
        }}
      />
      <MinimapPlayhead clock={clock} whole={whole} />
    </div>
  );
}

/** The playing moment on the minimap; subscribes alone, like the strip's playhead. */
function MinimapPlayhead({ clock, whole }: { clock: PlaybackClock; whole: TimelineView }) {
  const at = usePlaybackSelect(clock, (ms) => Math.min(1, Math.max(0, positionOf(ms, whole))));
  return <span style={{ position: 'absolute', left: `${at * 100}%`, top: 0, bottom: 0, width: 1, background: 'var(--mantine-color-red-7)' }} />;
}

/**
 * A hairline per mark (or per few, where they crowd) across the whole footage, drawn as one SVG path: hundreds of
 * marks cost one element, not one each. Memoised apart from the moving view.
 */
const MinimapTicks = memo(function MinimapTicks({ ticks }: { ticks: MarkCluster[] }) {
  const path = ticks.map((tick) => `M${(tick.x * MINIMAP_TICK_SPAN).toFixed(1)} 3V${MINIMAP_HEIGHT - 3}`).join('');
  return (
    <svg
      aria-hidden
      data-testid="timeline-minimap-ticks"
      width="100%"
      height={MINIMAP_HEIGHT}
      viewBox={`0 0 ${MINIMAP_TICK_SPAN} ${MINIMAP_HEIGHT}`}
      preserveAspectRatio="none"
      style={{ position: 'absolute', left: 0, top: 0, display: 'block' }}
    >
      <path d={path} stroke="var(--mantine-color-gray-6)" strokeWidth={1} vectorEffect="non-scaling-stroke" fill="none" />
    </svg>
  );
});
