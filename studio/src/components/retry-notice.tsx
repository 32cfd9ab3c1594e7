import { Alert, Button, Group, Stack, Text } from '@mantine/core';

interface RetryNoticeProps {
  /** What went wrong, as the API or the browser said it. */
  message: string;
  onRetry: () => void;
  /** A heading makes it a red panel for a whole section that failed; without one it is a line in place. */
  title?: string;
}

/** A failed load or send said in words, with the one action that may mend it. */
export function RetryNotice({ message, onRetry, title }: RetryNoticeProps) {
  const retry = (
    <Button size="xs" variant="default" onClick={onRetry}>
      Try again
    </Button>
  );
  if (title) {
    return (
      <Alert color="red" title={title} role="alert">
        <Group justify="space-between" gap="xs">
          <Text size="sm">{message}</Text>
          {retry}
        </Group>
      </Alert>
    );
  }
  return (
    <Stack gap={4} align="flex-start">
      <Text size="sm" c="red" role="alert">
        {message}
      </Text>
      {retry}
    </Stack>
  );
}
