import { Button, Stack, Text, Title } from '@mantine/core';
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useReleasePageShell } from '@/lib/page-shell';

export function ErrorView({ title, message }: { title: string; message: string }) {
  return (
    <Stack align="flex-start" py="xl">
      <Title order={2}>{title}</Title>
      <Text c="dimmed">{message}</Text>
      <Button component={Link} to={paths.home} variant="light">
        Back to the start page
      </Button>
    </Stack>
  );
}

/** The router's error element: a failed lazy chunk or a thrown render error reads as a sentence. */
export function RouteErrorView() {
  const error = useRouteError();
  // A page that failed says so at once rather than leaving the server's first paint in place.
  useReleasePageShell(true);
  if (isRouteErrorResponse(error) && error.status === 404) {
    return <ErrorView title="Page not found" message="There is nothing at this address." />;
  }
  const message = error instanceof Error ? error.message : 'Something went wrong while showing this page.';
  return <ErrorView title="Something went wrong" message={message} />;
}
