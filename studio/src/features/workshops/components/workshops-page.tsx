import { Alert, Anchor, Avatar, Badge, Card, Group, SimpleGrid, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { workshopQueries } from '../api/queries';
import { CreateWorkshopForm } from './create-workshop-form';

/** The signed-in person's workshops, and the form to start one. */
export function WorkshopsPage() {
  const navigate = useNavigate();
  const { user } = useSession();
  const workshops = useQuery(workshopQueries.mine());

  return (
    <Stack gap="lg" maw={960}>
      <Title order={2}>My workshops</Title>
      {workshops.isPending && <Skeleton height={96} />}
      {workshops.isError && <Alert color="red">{workshops.error.message}</Alert>}
      {workshops.data && workshops.data.length === 0 && (
        <Text c="dimmed">You are not a member of any workshop yet. Start your own below, or accept an invitation.</Text>
      )}
      {workshops.data && workshops.data.length > 0 && (
        <SimpleGrid cols={{ base: 1, sm: 2 }}>
          {workshops.data.map((workshop) => (
            <Card key={workshop.id} withBorder padding="md" radius="md">
              <Group wrap="nowrap" align="flex-start">
                <Avatar src={workshop.logoUrl} alt="" radius="md" color="patina">
                  {workshop.name.slice(0, 2).toUpperCase()}
                </Avatar>
                <Stack gap={2} style={{ minWidth: 0 }}>
                  <Anchor component={Link} to={paths.workshop.to(workshop.id)} fw={600}>
                    {workshop.name}
                  </Anchor>
                  <Text size="sm" c="dimmed" lineClamp={2}>
                    {workshop.description || `/${workshop.slug}`}
                  </Text>
                  <Group gap={6}>
                    <Badge size="sm" variant="light" color={workshop.role === 'owner' ? 'patina' : 'gray'}>
                      {workshop.role}
                    </Badge>
                    {workshop.disabled && (
                      <Badge size="sm" color="yellow">
                        disabled
                      </Badge>
                    )}
                  </Group>
                </Stack>
              </Group>
            </Card>
          ))}
        </SimpleGrid>
      )}
      <Card withBorder padding="lg" radius="md" maw={560}>
        <Title order={3} size="h4" mb="sm">
          Start a workshop
        </Title>
        {user && !user.emailVerified ? (
          <Alert color="yellow">
            Confirm your e-mail address first: follow the link we sent you, or ask for a new one in your{' '}
            <Anchor component={Link} to={paths.account}>
              account settings
            </Anchor>
            .
          </Alert>
        ) : (
          <CreateWorkshopForm onCreated={(workshop) => navigate(paths.workshop.to(workshop.id))} />
        )}
      </Card>
    </Stack>
  );
}
