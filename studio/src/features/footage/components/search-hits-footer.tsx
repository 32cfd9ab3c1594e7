import { Button, Group, Text } from '@mantine/core';

export interface SearchHitsFooterProps {
  total: number;
  shown: number;
  hasMore: boolean;
  loadingMore: boolean;
  onMore: () => void;
}

/** "791 hits — showing 1–50" and the way to the rest, so a search never looks complete when it is not. */
export function SearchHitsFooter({ total, shown, hasMore, loadingMore, onMore }: SearchHitsFooterProps) {
  if (total === 0) return null;
  return (
    <Group justify="space-between" gap="xs" data-testid="search-hits-footer">
      <Text size="xs" c="dimmed">
        {total === 1 ? '1 hit' : `${total.toLocaleString('en')} hits`}
        {shown < total ? ` — showing 1–${shown.toLocaleString('en')}` : ''}
      </Text>
      {hasMore && (
        <Button size="compact-xs" variant="light" loading={loadingMore} onClick={onMore}>
          Show more
        </Button>
      )}
    </Group>
  );
}
