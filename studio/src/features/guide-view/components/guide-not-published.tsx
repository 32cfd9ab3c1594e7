import { Button, Group, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** What a reader sees at the address of a guide that was never published, was withdrawn, or was mistyped. */
export function GuideNotPublished() {
  return (
    <Stack align="flex-start" py="xl" maw={640} data-testid="guide-not-published">
      <Title order={1}>This guide is not published</Title>
      <Text>
        There is no published guide at this address. Its workshop may have withdrawn it while they revise it, or the link
        may be mistyped.
      </Text>
      <Group>
        <Button component={Link} to={paths.guideIndex}>
          Browse published guides
        </Button>
      </Group>
    </Stack>
  );
}
