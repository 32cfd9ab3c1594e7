import { Avatar, Badge, Group, Stack, Tabs, Text, Title } from '@mantine/core';
import { useQuery } from '@tanstack/react-query';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { workshopQueries, type Workshop } from '../api/queries';

const ROLE_LABELS = { owner: 'Owner', editor: 'Editor', admin: 'Site admin (read only)' } as const;

/** Name, logo and role, with the workshop's own pages as tabs. */
export function WorkshopHeader({ workshop }: { workshop: Workshop }) {
  const navigate = useNavigate();
  const location = useLocation();
  const newReports = useQuery(workshopQueries.newFitReportCount(workshop.id));
  const newReportCount = newReports.data ?? 0;
  const tabs = [
    { value: paths.workshop.to(workshop.id), label: 'Overview' },
    { value: paths.builds.to(workshop.id), label: 'Builds' },
    { value: paths.parts.to(workshop.id), label: 'Parts' },
    { value: paths.workshopFitReports.to(workshop.id), label: 'Fit reports' },
    { value: paths.workshopMembers.to(workshop.id), label: 'Members' },
    { value: paths.workshopSettings.to(workshop.id), label: 'Settings' },
  ];
  const active = tabs.find((tab) => tab.value === location.pathname)?.value ?? null;
  return (
    <Stack gap="sm" mb="lg">
      <Group gap="md" wrap="nowrap">
        <Avatar src={workshop.logoUrl} alt="" size={56} radius="md" color="patina">
          {workshop.name.slice(0, 2).toUpperCase()}
        </Avatar>
        <div>
          <Group gap="xs">
            <Title order={2}>{workshop.name}</Title>
            {workshop.role && (
              <Badge variant="light" color={workshop.role === 'owner' ? 'patina' : 'gray'}>
                {ROLE_LABELS[workshop.role]}
              </Badge>
            )}
          </Group>
          <Text c="dimmed" size="sm">
            /{workshop.slug}
          </Text>
        </div>
      </Group>
      <Tabs value={active} onChange={(value) => value && navigate(value)} aria-label="Workshop pages">
        <Tabs.List>
          {tabs.map((tab) => (
            <Tabs.Tab
              key={tab.value}
              value={tab.value}
              rightSection={
                tab.value === paths.workshopFitReports.to(workshop.id) && newReportCount > 0 ? (
                  <Badge size="sm" circle={newReportCount < 10} variant="filled" color="orange" data-testid="new-fit-report-count" aria-label={`${newReportCount} new`}>
                    {newReportCount}
                  </Badge>
                ) : undefined
              }
            >
              {tab.label}
            </Tabs.Tab>
          ))}
        </Tabs.List>
      </Tabs>
    </Stack>
  );
}
