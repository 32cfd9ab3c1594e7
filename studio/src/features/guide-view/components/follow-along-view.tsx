import { Alert, Anchor, Box, Breadcrumbs, Button, Group, Skeleton, Stack, Text, Title, Typography } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { guideViewQueries } from '../api/queries';
import type { GuideFollowTargets, PublishedGuide } from '../api/types';
import { useGuidePlayer } from '../hooks/use-guide-player';
import { CautionsBlock } from './cautions-block';
import { ChecklistPanel } from './checklist-panel';
import { GuideNotPublished } from './guide-not-published';
import './guide-print.css';
import { GuideVideo } from './guide-video';
import classes from './guide-view.module.css';
import { MarksStrip } from './marks-strip';
import { NowPlaying } from './now-playing';
import { PartsPanel, SuppliesPanel } from './parts-panel';
import { StepList } from './step-list';
import { TranscriptPanel } from './transcript-panel';
import { formatDate } from '@/lib/dates';
import { GuideEffort } from '@/components/guide-effort';
import { useReleasePageShell } from '@/lib/page-shell';


/** The tab's title names the guide while it is open (and on the printout's header line). */
function useGuideTitle(title: string) {
  useEffect(() => {
    const previous = document.title;
    document.title = `${title} · Fitwright guide`;
    return () => {
      document.title = previous;
    };
  }, [title]);
}

/** The route hands in what goes beside the title to follow the guide's fit news (features do not import each other). */
export type FollowSlot = (targets: GuideFollowTargets) => ReactNode;

/** The route hands in what offers to send a fit report from this guide. */
export type ReportSlot = (guide: { workshopSlug: string; guideSlug: string; guideTitle: string }) => ReactNode;

/**
 * A published guide laid out to follow along: compact safety first, the video on the first screen with its steps
 * beside it (on a phone: the video stays at the top with the playing step under it), then the summary, the proof
 * and the parts.
 */
export function GuideDocument({
  data,
  followSlot,
  reportSlot,
  startAtMs,
}: {
  data: PublishedGuide;
  followSlot?: FollowSlot;
  reportSlot?: ReportSlot;
  /** Where the video starts: the evidence moment a fit finder result opens (`?t=`). */
  startAtMs?: number;
}) {
  const { guide, workshop, revision, footage } = data;
  // The document never reads the time: the step list, the line under the video, the marks' playhead and the
  // transcript listen to the clock themselves, so playing the video does not draw the whole guide again.
  const player = useGuidePlayer();
  useGuideTitle(guide.title);
  const mainFootageId = footage?.id ?? null;
  const seek = footage ? player.seek : undefined;

  return (
    <Stack gap="lg" className={classes.document} data-guide-document="">
      <Stack gap={4}>
        <Group justify="space-between" gap="xs" wrap="nowrap" className={classes.noPrint}>
          <Breadcrumbs>
            <Anchor component={Link} to={paths.guideIndex}>
              Guides
            </Anchor>
            <Text size="sm">{workshop.name}</Text>
          </Breadcrumbs>
          <Button variant="default" size="xs" onClick={() => window.print()}>
            Print
          </Button>
        </Group>
        <Group justify="space-between" align="flex-start" gap="sm">
          <div style={{ flex: '1 1 20rem' }}>
            <Title order={1}>{guide.title}</Title>
            <Text c="dimmed">
              {workshop.name} · {guide.buildTitle}
              {guide.vehicle ? ` · ${guide.vehicle}` : ''}
            </Text>
            <Text size="sm" data-testid="guide-revision">
              Revision {revision.number} · published {formatDate(revision.publishedAt)}
              {revision.note ? ` · ${revision.note}` : ''}
              <span className={classes.noPrint}>
                {' · '}
                <Anchor component={Link} to={paths.guideRevisions.to(workshop.slug, guide.slug)} size="sm">
                  Revision history
                </Anchor>
              </span>
            </Text>
            <GuideEffort skillLevel={guide.skillLevel} estimatedMinutes={guide.estimatedMinutes} steps={data.steps} />
          </div>
        </Group>
        <Text size="xs" className={classes.printOnly}>
          Printed from {window.location.origin}
          {paths.publicGuide.to(workshop.slug, guide.slug)}. Check there for a newer revision and the live checklist.
        </Text>
      </Stack>

      <div className={classes.followAlong} data-has-video={footage ? '' : undefined}>
        {/* First in reading order; on a phone the video is drawn above it (it is no step) and stays in view. */}
        <div className={classes.areaSafety}>
          <CautionsBlock guide={data} />
        </div>
        {footage && (
          // On a phone this area stays at the top while the page scrolls, with the playing step under the video.
          <div className={classes.areaVideo} data-testid="guide-player">
            <GuideVideo footage={footage} player={player} startAtMs={startAtMs} />
            <NowPlaying steps={data.steps} mainFootageId={mainFootageId} clock={player.clock} />
          </div>
        )}
        {footage && footage.durationMs !== null && (
          <div className={classes.areaMarks}>
            <MarksStrip marks={data.marks} durationMs={footage.durationMs} clock={player.clock} onSeek={player.seek} />
          </div>
        )}
        <div className={classes.areaSteps}>
          <StepList steps={data.steps} marks={data.marks} mainFootageId={mainFootageId} clock={player.clock} onSeek={player.seek} />
        </div>
        {footage && (
          <div className={classes.areaTranscript}>
            <TranscriptPanel workshopSlug={workshop.slug} guideSlug={guide.slug} clock={player.clock} onSeek={player.seek} />
          </div>
        )}
      </div>

      {/* Following and fit reports come after the follow-along, so the video and the cautions own the first screen. */}
      {((followSlot && data.followTargets) || reportSlot) && (
        <Group gap="lg" align="flex-start" className={classes.noPrint}>
          {/* An API from before follows sends no targets: then there is nothing to offer. */}
          {followSlot && data.followTargets && <Box style={{ flex: '1 1 18rem' }}>{followSlot(data.followTargets)}</Box>}
          {reportSlot && (
            <Box style={{ flex: '1 1 18rem' }}>{reportSlot({ workshopSlug: workshop.slug, guideSlug: guide.slug, guideTitle: guide.title })}</Box>
          )}
        </Group>
      )}

      {guide.summary && (
        <section aria-labelledby="guide-summary-heading">
          <Title order={2} size="h4" id="guide-summary-heading" className={classes.keepWithNext}>
            About this guide
          </Title>
          <Typography>
            {/* The server sanitises the summary (a short allow-list of tags) before it reaches any reader. */}
            <div dangerouslySetInnerHTML={{ __html: guide.summary }} />
          </Typography>
        </section>
      )}

      {data.checklist && <ChecklistPanel checklist={data.checklist} onSeek={seek} />}
      <div className={classes.reference}>
        {/* A guide that follows no assembly has no parts list to show. */}
        {(data.parts.length > 0 || data.checklist) && <PartsPanel parts={data.parts} />}
        <SuppliesPanel tools={guide.tools} consumables={guide.consumables} />
      </div>
    </Stack>
  );
}

/** The follow-along view of one published guide, for anyone. */
export function FollowAlongView({
  workshopSlug,
  guideSlug,
  followSlot,
  reportSlot,
  startAtMs,
}: {
  workshopSlug: string;
  guideSlug: string;
  followSlot?: FollowSlot;
  reportSlot?: ReportSlot;
  startAtMs?: number;
}) {
  const guide = useQuery(guideViewQueries.detail(workshopSlug, guideSlug));
  // The server's first paint of this page stays until the guide (or its failure) can take its place.
  useReleasePageShell(!guide.isPending);
  if (guide.isPending) {
    return (
      <Stack gap="md" aria-label="Loading the guide">
        <Skeleton height={36} width="60%" />
        <Skeleton height={120} />
        <Skeleton height={360} />
      </Stack>
    );
  }
  if (guide.isError) {
    if (guide.error instanceof ApiError && guide.error.status === 404) return <GuideNotPublished />;
    return (
      <Alert color="red" title="The guide could not be loaded">
        <Stack gap="xs" align="flex-start">
          <Text size="sm">{guide.error.message}</Text>
          <Button size="xs" variant="default" onClick={() => void guide.refetch()}>
            Try again
          </Button>
        </Stack>
      </Alert>
    );
  }
  return <GuideDocument data={guide.data} followSlot={followSlot} reportSlot={reportSlot} startAtMs={startAtMs} />;
}
