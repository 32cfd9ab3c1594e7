import { Alert, Button, Group, Text, type MantineSpacing } from '@mantine/core';

/** "1 follower", "3 followers": a count with its noun. */
export function countOf(n: number, one: string, many = `${one}s`): string {
  return `${n} ${n === 1 ? one : many}`;
}

interface FailedFitNewsProps {
  failed: number;
  /** What the mail was about, as the heading says it: "this build", "this check". */
  subject: string;
  canRetry: boolean;
  retry: { isPending: boolean; isError: boolean; error: Error | null; mutate: () => void };
  /** Said to owners after the cause, e.g. that paused addresses are left out. */
  retryNote?: string;
  mb?: MantineSpacing;
  'data-testid'?: string;
}

/**
 * Fit-news mail that did not get through, and for owners a way to send it again (the API leaves out
 * addresses paused after repeated refusals). Shown on a check's history and on the build page.
 */
export function FailedFitNewsAlert({ failed, subject, canRetry, retry, retryNote, mb, 'data-testid': testId }: FailedFitNewsProps) {
  if (failed === 0 && !retry.isError) return null;
  const cause = 'The followers’ mail servers refused them or we gave up trying.';
  return (
    <Alert color="yellow" role="status" title={`${countOf(failed, 'fit-news mail')} of ${subject} failed`} mb={mb} data-testid={testId}>
      <Group gap="sm" justify="space-between" align="center">
        <Text size="sm">
          {canRetry ? `${cause} Send them again once the cause is mended${retryNote ? `; ${retryNote}` : ''}.` : `${cause} A workshop owner can send them again.`}
        </Text>
        {canRetry && (
          <Button size="xs" loading={retry.isPending} onClick={() => retry.mutate()}>
            Retry failed
          </Button>
        )}
      </Group>
      {retry.isError && retry.error && (
        <Text size="sm" c="red" role="alert" mt="xs">
          {retry.error.message}
        </Text>
      )}
    </Alert>
  );
}
