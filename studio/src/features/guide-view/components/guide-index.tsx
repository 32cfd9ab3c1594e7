import { Alert, Anchor, AspectRatio, Box, Card, Image, Loader, SimpleGrid, Skeleton, Stack, Text, TextInput, Title } from '@mantine/core';
import { useDebouncedCallback } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { guideViewQueries } from '../api/queries';
import type { PublishedGuideSummary } from '../api/types';
import classes from './guide-view.module.css';
import { formatDate } from '@/lib/dates';
import { GuideEffort } from '@/components/guide-effort';
import { useReleasePageShell } from '@/lib/page-shell';


function GuideCard({ guide }: { guide: PublishedGuideSummary }) {
  const to = paths.publicGuide.to(guide.workshop.slug, guide.slug);
  return (
    <Card withBorder padding="sm" component="article" data-testid="guide-card" className={classes.guideCard}>
      <Card.Section>
        <AspectRatio ratio={16 / 9}>
          {guide.posterUrl ? (
            <Image src={guide.posterUrl} alt="" fit="cover" loading="lazy" />
          ) : (
            <Box bg="gray.1" className={classes.noPoster}>
              <Text size="sm" c="dimmed">
                No video
              </Text>
            </Box>
          )}
        </AspectRatio>
      </Card.Section>
      <Stack gap={4} mt="sm">
        {/* The title's link covers the whole card (see .guideCard), so the card reads as one link named by the title. */}
        <Title order={2} size="h4">
          <Link to={to} className={classes.cardLink}>
            {guide.title}
          </Link>
        </Title>
        <Text size="sm">{guide.workshop.name}</Text>
        <Text size="sm" c="dimmed">
          Build: {guide.buildTitle}
        </Text>
        <Text size="xs" c="dimmed">
          Revision {guide.revision} · {formatDate(guide.publishedAt)} · {guide.stepCount}{' '}
          {guide.stepCount === 1 ? 'step' : 'steps'}
        </Text>
        <GuideEffort skillLevel={guide.skillLevel} estimatedMinutes={guide.estimatedMinutes} size="xs" />
      </Stack>
    </Card>
  );
}

/** Every published guide, newest first, with a search over them. */
export function GuideIndex() {
  const [params, setParams] = useSearchParams();
  const q = params.get('q')?.trim() ?? '';
  const [typed, setTyped] = useState(q);
  const guides = useQuery(guideViewQueries.list(q));
  useReleasePageShell(!guides.isPending);

  // The address holds the search (so it can be shared), updated once typing pauses.
  const applySearch = useDebouncedCallback((value: string) => {
    setParams(value.trim() ? { q: value.trim() } : {}, { replace: true });
  }, 300);

  return (
    <Stack gap="md">
      <div>
        <Title order={1}>Guides</Title>
        <Text c="dimmed">Step-by-step builds to follow beside their video, each with its verified-fit checklist.</Text>
        <Text size="sm">
          Looking for parts that fit what you have?{' '}
          <Anchor component={Link} to={paths.fitFinder}>
            Try the fit finder
          </Anchor>
          : it looks across every guide for proven fits by spline, diameter, length or part number.
        </Text>
      </div>
      <TextInput
        type="search"
        label="Search guides"
        placeholder="Title, build or workshop"
        maw={480}
        value={typed}
        onChange={(event) => {
          setTyped(event.currentTarget.value);
          applySearch(event.currentTarget.value);
        }}
        rightSection={guides.isFetching && !guides.isPending ? <Loader size="xs" /> : null}
      />
      {guides.isPending ? (
        <SimpleGrid cols={{ base: 1, sm: 2, lg: 3 }}>
          {[0, 1, 2].map((index) => (
            <Skeleton key={index} height={260} />
          ))}
        </SimpleGrid>
      ) : guides.isError ? (
        <Alert color="red" title="The guides could not be loaded">
          {guides.error.message}
        </Alert>
      ) : guides.data.length === 0 ? (
        <Text c="dimmed" data-testid="guides-empty">
          {q ? `No published guide matches “${q}”.` : 'No guides are published yet.'}
        </Text>
      ) : (
        <>
          <Text size="sm" c="dimmed" aria-live="polite">
            {guides.isPlaceholderData
              ? 'Searching…'
              : q
              ? `${guides.data.length} ${guides.data.length === 1 ? 'guide matches' : 'guides match'} “${q}”`
              : `${guides.data.length} published ${guides.data.length === 1 ? 'guide' : 'guides'}, newest first`}
          </Text>
          <SimpleGrid
            cols={{ base: 1, sm: 2, lg: 3 }}
            component="section"
            aria-label="Published guides"
            aria-busy={guides.isPlaceholderData}
            style={{ opacity: guides.isPlaceholderData ? 0.6 : 1 }}
          >
            {guides.data.map((guide) => (
              <GuideCard key={`${guide.workshop.slug}/${guide.slug}`} guide={guide} />
            ))}
          </SimpleGrid>
        </>
      )}
    </Stack>
  );
}
