import { Alert, Badge, Button, Group, Pagination, Skeleton, Stack, Table, Tabs, Text, TextInput, Title } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { useQuery, type UseQueryResult } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useSession } from '@/lib/session';
import { useSetUserDisabled, useSetWorkshopDisabled } from '../api/mutations';
import { adminQueries } from '../api/queries';
import { formatDate } from '@/lib/dates';


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

function StatusBadge({ disabled }: { disabled: boolean }) {
  return disabled ? (
    <Badge size="sm" color="red">
      disabled
    </Badge>
  ) : (
    <Badge size="sm" color="gray" variant="light">
      active
    </Badge>
  );
}

function ToggleDisabledButton({ disabled, onClick }: { disabled: boolean; onClick: () => void }) {
  return (
    <Button size="compact-xs" variant="subtle" color={disabled ? 'patina' : 'red'} onClick={onClick}>
      {disabled ? 'Enable' : 'Disable'}
    </Button>
  );
}

interface AdminListProps<T> {
  label: string;
  placeholder: string;
  search: ReturnType<typeof useSearch>;
  result: UseQueryResult<{ items: T[]; total: number; pageSize: number }>;
  headers: string[];
  renderRow: (item: T) => ReactNode;
}

/** A searchable, paged table of users or workshops. */
function AdminList<T>({ label, placeholder, search, result, headers, renderRow }: AdminListProps<T>) {
  return (
    <AdminFrame>
      <TextInput
        label={`Search ${label.toLowerCase()}`}
        placeholder={placeholder}
        value={search.search}
        onChange={(event) => search.setSearch(event.currentTarget.value)}
        maw={360}
      />
      {result.isPending && <Skeleton height={160} />}
      {result.isError && <Alert color="red">{result.error.message}</Alert>}
      {result.data && (
        <>
          <Table.ScrollContainer minWidth={640}>
            <Table verticalSpacing="xs" aria-label={label} striped>
              <Table.Thead>
                <Table.Tr>
                  {headers.map((header) => (
                    <Table.Th key={header}>{header}</Table.Th>
                  ))}
                  <Table.Th />
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>{result.data.items.map(renderRow)}</Table.Tbody>
            </Table>
          </Table.ScrollContainer>
          <Paging total={result.data.total} pageSize={result.data.pageSize} page={search.page} onChange={search.setPage} />
        </>
      )}
    </AdminFrame>
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
    <AdminList
      label="Users"
      placeholder="Name or e-mail address"
      search={search}
      result={users}
      headers={['User', 'Status', 'Joined']}
      renderRow={(user) => (
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
              <StatusBadge disabled={user.disabled} />
            </Group>
          </Table.Td>
          <Table.Td>
            <Text size="sm">{formatDate(user.createdAt)}</Text>
          </Table.Td>
          <Table.Td>
            <Group justify="flex-end">
              {user.id !== me?.id && (
                <ToggleDisabledButton disabled={user.disabled} onClick={() => handleToggle(user.id, user.displayName, !user.disabled)} />
              )}
            </Group>
          </Table.Td>
        </Table.Tr>
      )}
    />
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
    <AdminList
      label="Workshops"
      placeholder="Name or web address"
      search={search}
      result={workshops}
      headers={['Workshop', 'Owners', 'Members', 'Status']}
      renderRow={(workshop) => (
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
            <StatusBadge disabled={workshop.disabled} />
          </Table.Td>
          <Table.Td>
            <Group justify="flex-end">
              <ToggleDisabledButton
                disabled={workshop.disabled}
                onClick={() => handleToggle(workshop.id, workshop.name, !workshop.disabled)}
              />
            </Group>
          </Table.Td>
        </Table.Tr>
      )}
    />
  );
}
