import { Card, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { Workshop } from '../api/queries';
import { WorkshopGate } from './workshop-gate';
import { WorkshopHeader } from './workshop-header';

function Destination({ to, title, text }: { to: string; title: string; text: string }) {
  return (
    <Card component={Link} to={to} withBorder padding="lg" radius="md">
      <Title order={3} size="h4">
        {title}
      </Title>
      <Text size="sm" c="dimmed" mt={4}>
        {text}
      </Text>
    </Card>
  );
}

function Overview({ workshop }: { workshop: Workshop }) {
  return (
    <Stack>
      <WorkshopHeader workshop={workshop} />
      {workshop.description && <Text maw={720}>{workshop.description}</Text>}
      <SimpleGrid cols={{ base: 1, sm: 2 }} maw={880}>
        <Destination to={paths.builds.to(workshop.id)} title="Builds" text="Projects, their assemblies and verified-fit checklists." />
        <Destination to={paths.parts.to(workshop.id)} title="Parts" text="Part numbers, makers and the features that mate." />
        <Destination
          to={paths.workshopFitReports.to(workshop.id)}
          title="Fit reports"
          text="Readers' claims that a combination fit, or did not, to review and verify."
        />
        <Destination to={paths.workshopMembers.to(workshop.id)} title="Members" text="Who may edit this workshop, and invitations." />
        <Destination to={paths.workshopSettings.to(workshop.id)} title="Settings" text="Name, web address, description and logo." />
      </SimpleGrid>
    </Stack>
  );
}

export function WorkshopOverviewPage({ workshopId }: { workshopId: string }) {
  return <WorkshopGate workshopId={workshopId}>{(workshop) => <Overview workshop={workshop} />}</WorkshopGate>;
}
