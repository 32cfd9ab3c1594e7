import { Alert, Anchor, Badge, Breadcrumbs, Grid, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useMemo, useState, type ComponentType } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { captionsUrl, footageQueries, transcriptQueries } from '../api/queries';
import type { Footage } from '../api/types';
import { FootageStateBadge } from './footage-state-badge';
import { formatClock } from '@/lib/clock';
import { formatBytes } from './format';
import { RenditionsStatus } from './renditions-status';
import { TranscriptPane } from './transcript-pane';
import { FootagePlayer } from '@/components/footage-player/footage-player';
import { useFootagePlayer } from '@/components/footage-player/use-footage-player';
import { PlaybackTime } from '@/components/playback-time';
import type { PlaybackClock } from '@/lib/playback-clock';

export interface FootagePlayerPageProps {
  workshopId: string;
  footageId: string;
  /** Where to start, e.g. from a transcript search result (`?t=`). */
  startAtMs?: number;
  /** More tools under the video (the marking workspace, composed by the route), given the player to drive. */
  workspace?: ComponentType<{ workshopId: string; footageId: string; player: FootagePlayerHandle }>;
}

/** The player as other tools see it: where it is, how long the footage is, and how to move it. */
export interface FootagePlayerHandle {
  /**
   * Where the video is, as a subscription: only the parts that show the time subscribe (`usePlaybackMs`,
   * `usePlaybackSelect`), so a time update never re-renders the page or the workspace.
   */
  clock: PlaybackClock;
  durationMs: number | null;
  readPositionMs: () => number;
  seek: (ms: number) => void;
  pause: () => void;
  /** Scrub previews (WebVTT thumbnails) and the audio's peaks, once the pipeline has made them. */
  media: { thumbnailsUrl: string | null; waveformUrl: string | null };
  /** Where every hit of the transcript search starts (all of them, not one page), while there is a search. */
  hitStartsMs?: readonly number[];
}

/** Under the marking tools the picture stays short enough that the controls below are in view. */
const PLAYER_MAX_HEIGHT = 'max(10rem, calc(100dvh - 33rem))';

function describe(footage: Footage): string {
  const parts = [
    footage.durationMs !== null ? formatClock(footage.durationMs) : null,
    // As shown (after rotation): a portrait phone clip reads 1080×1920.
    footage.width && footage.height ? `${footage.displayWidth ?? footage.width}×${footage.displayHeight ?? footage.height}` : null,
    footage.frameRate ? `${footage.frameRate} fps` : null,
    [footage.videoCodec, footage.audioCodec].filter(Boolean).join(' + ') || null,
    formatBytes(footage.sizeBytes),
    footage.originalName,
  ];
  return parts.filter(Boolean).join(' · ');
}

/** The player: the video with its transcript as captions, and the transcript beside it to follow, search and jump. */
export function FootagePlayerPage({ workshopId, footageId, startAtMs, workspace: Workspace }: FootagePlayerPageProps) {
  const footage = useQuery(footageQueries.detail(workshopId, footageId));
  const ready = footage.data?.state === 'ready';
  // The previous answer stays while the next is read (the renditions became ready), so the player is never unmounted mid-play.
  const playback = useQuery({
    ...footageQueries.playback(workshopId, footageId, footage.data?.renditions?.state),
    enabled: ready,
    placeholderData: keepPreviousData,
  });
  const transcript = useQuery({ ...transcriptQueries.active(workshopId, footageId), enabled: ready });
  const limits = useQuery(footageQueries.limits(workshopId));
  const player = useFootagePlayer();
  // The page never reads the time itself: the badge, the playing cue and the workspace's playhead subscribe.
  const [searchQuery, setSearchQuery] = useState('');
  const moments = useQuery({ ...transcriptQueries.moments(workshopId, footageId, searchQuery), enabled: ready && searchQuery !== '' });
  const hitStartsMs = searchQuery !== '' ? moments.data?.startMs : undefined;
  const thumbnailsUrl = playback.data?.thumbnailsUrl ?? null;
  const waveformUrl = playback.data?.waveformUrl ?? null;
  const durationMs = footage.data?.durationMs ?? null;
  const handle = useMemo<FootagePlayerHandle>(
    () => ({
      clock: player.clock,
      durationMs,
      readPositionMs: player.readPositionMs,
      seek: (ms) => player.seek(ms, { play: true }),
      pause: player.pause,
      media: { thumbnailsUrl, waveformUrl },
      hitStartsMs,
    }),
    [player, durationMs, thumbnailsUrl, waveformUrl, hitStartsMs],
  );

  if (footage.isPending) return <Skeleton height={420} />;
  if (footage.isError) return <Alert color="red" title="Footage not found">{footage.error.message}</Alert>;
  const item = footage.data;

  return (
    <Stack gap="md">
      <Breadcrumbs>
        <Anchor component={Link} to={paths.build.to(workshopId, item.buildId)}>
          Build
        </Anchor>
        <Text>{item.title}</Text>
      </Breadcrumbs>
      <Group justify="space-between" align="flex-start">
        <div>
          <Title order={2}>{item.title}</Title>
          <Text size="sm" c="dimmed">
            {describe(item)}
          </Text>
        </div>
        <FootageStateBadge state={item.state} />
      </Group>
      {!ready && (
        <Alert color={item.state === 'failed' ? 'red' : 'blue'} title={item.state === 'failed' ? 'This footage failed' : 'Not ready yet'}>
          {item.state === 'failed'
            ? item.failureReason
            : item.state === 'processing'
              ? 'The video is being checked and a poster frame made; this page updates by itself.'
              : 'The upload has not finished. Go back to the build to resume it.'}
        </Alert>
      )}
      {ready && <RenditionsStatus footage={item} />}
      {ready && (
        <Grid gap="md">
          <Grid.Col span={{ base: 12, md: 8 }}>
            {playback.isError && <Alert color="red" title="The video cannot be played">{playback.error.message}</Alert>}
            {playback.data ? (
              <FootagePlayer
                control={player}
                sources={{ hlsUrl: playback.data.hlsUrl ?? null, fileUrl: playback.data.url }}
                fileLinkExpiresAt={playback.data.expiresAt}
                onRenewFileLink={() => void playback.refetch()}
                posterUrl={item.posterUrl}
                captions={
                  transcript.data
                    ? { src: captionsUrl(workshopId, footageId, transcript.data.revision), label: `Transcript (revision ${transcript.data.revision})` }
                    : null
                }
                label={`Video: ${item.title}`}
                displayWidth={playback.data.displayWidth ?? item.displayWidth ?? item.width}
                displayHeight={playback.data.displayHeight ?? item.displayHeight ?? item.height}
                maxHeight={Workspace ? PLAYER_MAX_HEIGHT : undefined}
                startAtMs={startAtMs}
                cannotPlayMessage="This browser cannot play the video. Download it, or convert it to H.264 MP4 or VP9 WebM."
                testId="footage-video"
              />
            ) : (
              <Skeleton height={360} />
            )}
            <Group gap="xs" mt="xs">
              <Badge variant="default" data-testid="player-position">
                <PlaybackTime clock={player.clock} />
              </Badge>
              {item.durationMs !== null && (
                <Text size="xs" c="dimmed">
                  of {formatClock(item.durationMs)}
                </Text>
              )}
            </Group>
            {Workspace && (
              <Workspace
                workshopId={workshopId}
                footageId={footageId}
                player={handle}
              />
            )}
          </Grid.Col>
          <Grid.Col span={{ base: 12, md: 4 }}>
            {transcript.isPending ? (
              <Skeleton height={360} />
            ) : transcript.isError ? (
              <Alert color="red" title="The transcript could not be loaded">{transcript.error.message}</Alert>
            ) : (
              <TranscriptPane
                workshopId={workshopId}
                footageId={footageId}
                transcript={transcript.data}
                clock={player.clock}
                transcriptMaxBytes={limits.data?.transcriptMaxBytes ?? 2_000_000}
                onSeek={handle.seek}
                onSearchChange={setSearchQuery}
              />
            )}
          </Grid.Col>
        </Grid>
      )}
    </Stack>
  );
}
