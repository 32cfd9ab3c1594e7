import { Badge, Group } from '@mantine/core';
import type { Guide, PublishedRevision } from '../api/types';

/** One line for where a guide stands, in words (the badges' colours only help). */
export function describeStatus(guide: { status: Guide['status']; publishedRevision: PublishedRevision | null }): string {
  if (guide.status === 'published' && guide.publishedRevision) return `Published — revision ${guide.publishedRevision.number}`;
  if (guide.status === 'published') return 'Published';
  return guide.publishedRevision ? `Draft — withdrawn after revision ${guide.publishedRevision.number}` : 'Draft — not published yet';
}

/** Draft or published, and whether edits since the last revision are waiting; always as text. */
export function GuideStatusBadges({ status, hasUnpublishedChanges }: { status: Guide['status']; hasUnpublishedChanges: boolean }) {
  return (
    <Group gap={6} wrap="nowrap">
      <Badge variant={status === 'published' ? 'filled' : 'outline'} color={status === 'published' ? 'patina' : 'gray'} data-testid="guide-state" data-state={status}>
        {status === 'published' ? 'Published' : 'Draft'}
      </Badge>
      {status === 'published' && hasUnpublishedChanges && (
        <Badge variant="light" color="yellow" data-testid="unpublished-changes">
          Unpublished changes
        </Badge>
      )}
    </Group>
  );
}
