import { Alert, Badge, Button, Group, Pagination, Skeleton, Stack, Table, Tabs, Text, TextInput, Title } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useSession } from '@/lib/session';
import { useSetUserDisabled, useSetWorkshopDisabled } from '../api/mutations';
import { adminQueries } from '../api/queries';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

function AdminFrame({ children }: { children: ReactNode }) {
  const navigate = useNavigate();
  const location = useLocation();
  return (
    <Stack maw={1040}>
      <Title order={2}>Site administration</Title>
      <Tabs value={location.pathname} onChange={(value) => value && navigate(value)} aria-label="Administration pages">
        <Tabs.List>
          <Tabs.Tab value={paths.adminUsers}>Users</Tabs.Tab>
          <Tabs.Tab value={paths.adminWorkshops}>Workshops</Tabs.Tab>
        </Tabs.List>
      </Tabs>
      {children}
    </Stack>
  );
}

function useSearch() {
  const [search, setSearch] = useState('');
  const [page, setPage] = useState(1);
  const [debounced] = useDebouncedValue(search.trim(), 300);
  return {
    search,
    page,
    filters: { search: debounced, page },
    setSearch: (value: string) => {
      setSearch(value);
      setPage(1);
    },
    setPage,
  };
}

function Paging({ total, pageSize, page, onChange }: { total: number; pageSize: number; page: number; onChange: (page: number) => void }) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <Group justify="space-between">
      <Text size="sm" c="dimmed">
        {total} found
      </Text>
      {pages > 1 && <Pagination total={pages} value={page} onChange={onChange} size="sm" />}
    </Group>
  );
}

export function AdminUsersPage() {
  const { user: me } = useSession();
  const search = useSearch();
  const users = useQuery(adminQueries.users(search.filters));
  const setDisabled = useSetUserDisabled();

  const handleToggle = (userId: string, name: string, disabled: boolean) => {
    if (disabled && !window.confirm(`Disable ${name}? They are signed out at once and cannot sign in until enabled.`)) return;
    setDisabled.mutate({ userId, disabled }, { onError: (error) => notifyError('Could not change the account', error) });
  };

  return (
    <AdminFrame>
      <TextInput
        label="Search users"
        placeholder="Name or e-mail address"
        value={search.search}
        onChange={(event) => search.setSearch(event.currentTarget.value)}
        maw={360}
      />
      {users.isPending && <Skeleton height={160} />}
      {users.isError && <Alert color="red">{users.error.message}</Alert>}
      {users.data && (
        <>
          <Table.ScrollContainer minWidth={640}>
            <Table verticalSpacing="xs" aria-label="Users" striped>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>User</Table.Th>
                  <Table.Th>Status</Table.Th>
                  <Table.Th>Joined</Table.Th>
                  <Table.Th />
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {users.data.items.map((user) => (
                  <Table.Tr key={user.id}>
                    <Table.Td>
                      <Text size="sm" fw={500}>
                        {user.displayName}
                      </Text>
                      <Text size="xs" c="dimmed">
                        {user.email}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      <Group gap={4}>
                        {user.isAdmin && <Badge size="sm">admin</Badge>}
                        {!user.emailVerified && (
                          <Badge size="sm" color="yellow" variant="light">
                            unconfirmed
                          </Badge>
                        )}
                        {user.disabled ? (
                          <Badge size="sm" color="red">
                            disabled
                          </Badge>
                        ) : (
                          <Badge size="sm" color="gray" variant="light">
                            active
                          </Badge>
                        )}
                      </Group>
                    </Table.Td>
                    <Table.Td>
                      <Text size="sm">{dateFormat.format(new Date(user.createdAt))}</Text>
                    </Table.Td>
                    <Table.Td>
                      <Group justify="flex-end">
                        {user.id !== me?.id && (
                          <Button
                            size="compact-xs"
                            variant="subtle"
                            color={user.disabled ? 'patina' : 'red'}
                            onClick={() => handleToggle(user.id, user.displayName, !user.disabled)}
                          >
                            {user.disabled ? 'Enable' : 'Disable'}
                          </Button>
                        )}
                      </Group>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
          <Paging total={users.data.total} pageSize={users.data.pageSize} page={search.page} onChange={search.setPage} />
        </>
      )}
    </AdminFrame>
  );
}

export function AdminWorkshopsPage() {
  const search = useSearch();
  const workshops = useQuery(adminQueries.workshops(search.filters));
  const setDisabled = useSetWorkshopDisabled();

  const handleToggle = (workshopId: string, name: string, disabled: boolean) => {
    if (disabled && !window.confirm(`Disable ${name}? Its members can still read it, but nobody can change it.`)) return;
    setDisabled.mutate({ workshopId, disabled }, { onError: (error) => notifyError('Could not change the workshop', error) });
  };

  return (
    <AdminFrame>
      <TextInput
        label="Search workshops"
        placeholder="Name or web address"
        value={search.search}
        onChange={(event) => search.setSearch(event.currentTarget.value)}
        maw={360}
      />
      {workshops.isPending && <Skeleton height={160} />}
      {workshops.isError && <Alert color="red">{workshops.error.message}</Alert>}
      {workshops.data && (
        <>
          <Table.ScrollContainer minWidth={640}>
            <Table verticalSpacing="xs" aria-label="Workshops" striped>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th>Workshop</Table.Th>
                  <Table.Th>Owners</Table.Th>
                  <Table.Th>Members</Table.Th>
                  <Table.Th>Status</Table.Th>
                  <Table.Th />
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {workshops.data.items.map((workshop) => (
                  <Table.Tr key={workshop.id}>
                    <Table.Td>
                      <Text size="sm" fw={500}>
                        {workshop.name}
                      </Text>
                      <Text size="xs" c="dimmed">
                        /{workshop.slug}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      <Text size="xs">{workshop.owners.join(', ')}</Text>
                    </Table.Td>
                    <Table.Td>{workshop.memberCount}</Table.Td>
                    <Table.Td>
                      {workshop.disabled ? (
                        <Badge size="sm" color="red">
                          disabled
                        </Badge>
                      ) : (
                        <Badge size="sm" color="gray" variant="light">
                          active
                        </Badge>
                      )}
                    </Table.Td>
                    <Table.Td>
                      <Group justify="flex-end">
                        <Button
                          size="compact-xs"
                          variant="subtle"
                          color={workshop.disabled ? 'patina' : 'red'}
                          onClick={() => handleToggle(workshop.id, workshop.name, !workshop.disabled)}
                        >
                          {workshop.disabled ? 'Enable' : 'Disable'}
                        </Button>
                      </Group>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
          <Paging total={workshops.data.total} pageSize={workshops.data.pageSize} page={search.page} onChange={search.setPage} />
        </>
      )}
    </AdminFrame>
  );
}
