import { Button, Group, List, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

export function HomeRoute() {
  return (
    <Stack maw={720} gap="md">
      <Title order={1}>Prove the fit. Publish the build.</Title>
      <Text size="lg">
        Fitwright turns your shop footage into step-by-step build guides with a verified-fit checklist: every
        part, measurement and test fit tied to the moment in the video that shows it.
      </Text>
      <List spacing="xs">
        <List.Item>Upload footage and its transcript; spoken measurements and part numbers become marks.</List.Item>
        <List.Item>Let the server do the arithmetic: units, clearances, ISO 286 fits, splines and length windows.</List.Item>
        <List.Item>Followers hear the moment a fit is confirmed.</List.Item>
      </List>
      <Group>
        <Button component={Link} to={paths.guideIndex}>
          Read the published build guides
        </Button>
        <Button component={Link} to={paths.fitCalculator} variant="light">
          Try the fit calculator
        </Button>
        <Button component={Link} to={paths.workshops} variant="subtle">
          Open your workshop
        </Button>
      </Group>
    </Stack>
  );
}
