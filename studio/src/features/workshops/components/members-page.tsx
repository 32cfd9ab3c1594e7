import { Alert, Badge, Button, Group, Paper, Select, Skeleton, Stack, Table, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { splitApiErrors } from '@/lib/form-errors';
import { notifyDone, notifyError } from '@/lib/notify';
import { useSession } from '@/lib/session';
import {
  useChangeRole,
  useInvite,
  useLeaveWorkshop,
  useRemoveMember,
  useRevokeInvitation,
  useTransferOwnership,
} from '../api/mutations';
import { workshopQueries, type Member, type MemberRole, type Workshop } from '../api/queries';
import { WorkshopGate } from './workshop-gate';
import { WorkshopHeader } from './workshop-header';
import { formatDate } from '@/lib/dates';
import { FormProblems } from '@/components/form-problems';

const ROLE_OPTIONS = [
  { value: 'editor', label: 'Editor' },
  { value: 'owner', label: 'Owner' },
];

function MemberRow({ workshop, member, isMe, canManage }: { workshop: Workshop; member: Member; isMe: boolean; canManage: boolean }) {
  const changeRole = useChangeRole(workshop.id);
  const remove = useRemoveMember(workshop.id);
  const transfer = useTransferOwnership(workshop.id);

  const handleRoleChange = (role: string | null) => {
    if (role !== 'owner' && role !== 'editor') return;
    changeRole.mutate(
      { userId: member.userId, role },
      { onSuccess: () => notifyDone(`${member.displayName} is now ${role === 'owner' ? 'an owner' : 'an editor'}`), onError: (error) => notifyError('Could not change the role', error) },
    );
  };
  const handleRemove = () => {
    if (!window.confirm(`Remove ${member.displayName} from ${workshop.name}?`)) return;
    remove.mutate(member.userId, { onError: (error) => notifyError('Could not remove the member', error) });
  };
  const handleTransfer = () => {
    if (!window.confirm(`Make ${member.displayName} the owner of ${workshop.name}? You will become an editor.`)) return;
    transfer.mutate(member.userId, {
      onSuccess: () => notifyDone(`${member.displayName} now owns ${workshop.name}`),
      onError: (error) => notifyError('Could not transfer ownership', error),
    });
  };

  return (
    <Table.Tr data-testid={`member-${member.email}`}>
      <Table.Td>
        <Text fw={500} size="sm">
          {member.displayName} {isMe && <Badge size="xs" variant="outline">you</Badge>}
        </Text>
        <Text size="xs" c="dimmed">
          {member.email}
        </Text>
      </Table.Td>
      <Table.Td>
        {canManage && !isMe ? (
          <Select
            aria-label={`Role of ${member.displayName}`}
            size="xs"
            w={120}
            data={ROLE_OPTIONS}
            value={member.role}
            onChange={handleRoleChange}
            allowDeselect={false}
            disabled={changeRole.isPending}
          />
        ) : (
          <Badge variant="light" color={member.role === 'owner' ? 'patina' : 'gray'}>
            {member.role}
          </Badge>
        )}
      </Table.Td>
      <Table.Td visibleFrom="sm">
        <Text size="sm">{formatDate(member.joinedAt)}</Text>
      </Table.Td>
      <Table.Td>
        {canManage && !isMe && (
          <Group gap={4} justify="flex-end">
            {member.role === 'editor' && (
              <Button size="compact-xs" variant="subtle" onClick={handleTransfer} loading={transfer.isPending}>
                Transfer ownership
              </Button>
            )}
            <Button size="compact-xs" variant="subtle" color="red" onClick={handleRemove} loading={remove.isPending}>
              Remove
            </Button>
          </Group>
        )}
      </Table.Td>
    </Table.Tr>
  );
}

function InviteForm({ workshopId }: { workshopId: string }) {
  const invite = useInvite(workshopId);
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    initialValues: { email: '', role: 'editor' as MemberRole },
    validate: { email: (value) => (/^\S+@\S+\.\S+$/.test(value.trim()) ? null : 'Enter an e-mail address') },
  });
  return (
    <form
      noValidate
      aria-label="Invite a member"
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        invite.mutate(values, {
          onSuccess: (invitation) => {
            notifyDone(`Invitation sent to ${invitation.email}`);
            form.reset();
          },
          onError: (error) => {
            const { fields, general } = splitApiErrors(error, { email: 'E-mail address', role: 'Role' });
            form.setErrors(fields);
            setProblem(general.join(' ') || null);
          },
        });
      })}
    >
      <Stack gap="sm">
        <FormProblems messages={problem} />
        <Group align="flex-start" gap="sm">
          <TextInput label="E-mail address" type="email" style={{ flex: 1, minWidth: 220 }} {...form.getInputProps('email')} />
          <Select label="Role" w={130} data={ROLE_OPTIONS} allowDeselect={false} {...form.getInputProps('role')} />
        </Group>
        <Group>
          <Button type="submit" loading={invite.isPending}>
            Send invitation
          </Button>
        </Group>
        <Text size="xs" c="dimmed">
          The link works for 7 days. Editors may do everything except manage members; owners manage members too.
        </Text>
      </Stack>
    </form>
  );
}

function PendingInvitations({ workshopId }: { workshopId: string }) {
  const invitations = useQuery(workshopQueries.invitations(workshopId));
  const revoke = useRevokeInvitation(workshopId);
  if (invitations.isPending) return <Skeleton height={60} />;
  if (invitations.isError) return <Alert color="red">{invitations.error.message}</Alert>;
  if (invitations.data.length === 0) return <Text c="dimmed" size="sm">No invitations are waiting.</Text>;
  return (
    <Table.ScrollContainer minWidth={480}>
      <Table verticalSpacing="xs" aria-label="Pending invitations">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>E-mail address</Table.Th>
            <Table.Th>Role</Table.Th>
            <Table.Th>Expires</Table.Th>
            <Table.Th />
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {invitations.data.map((invitation) => (
            <Table.Tr key={invitation.id}>
              <Table.Td>
                <Text size="sm">{invitation.email}</Text>
                {invitation.invitedBy && (
                  <Text size="xs" c="dimmed">
                    invited by {invitation.invitedBy}
                  </Text>
                )}
              </Table.Td>
              <Table.Td>
                <Badge variant="light" color="gray">
                  {invitation.role}
                </Badge>
              </Table.Td>
              <Table.Td>
                {invitation.expired ? (
                  <Badge color="yellow">expired</Badge>
                ) : (
                  <Text size="sm">{formatDate(invitation.expiresAt)}</Text>
                )}
              </Table.Td>
              <Table.Td>
                <Group justify="flex-end">
                  <Button
                    size="compact-xs"
                    variant="subtle"
                    color="red"
                    onClick={() => revoke.mutate(invitation.id, { onError: (error) => notifyError('Could not revoke', error) })}
                  >
                    Revoke
                  </Button>
                </Group>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

function Members({ workshop }: { workshop: Workshop }) {
  const navigate = useNavigate();
  const { user } = useSession();
  const members = useQuery(workshopQueries.members(workshop.id));
  const leave = useLeaveWorkshop(workshop.id);
  const canManage = workshop.role === 'owner' && !workshop.disabled;
  const isMember = workshop.role === 'owner' || workshop.role === 'editor';

  const handleLeave = () => {
    if (!window.confirm(`Leave ${workshop.name}? You will need a new invitation to come back.`)) return;
    leave.mutate(undefined, {
      onSuccess: () => navigate(paths.workshops),
      onError: (error) => notifyError('Could not leave the workshop', error),
    });
  };

  return (
    <Stack>
      <WorkshopHeader workshop={workshop} />
      <Stack maw={880} gap="lg">
        <Paper withBorder p="lg" radius="md">
          <Group justify="space-between" mb="sm">
            <Title order={3} size="h4">
              Members
            </Title>
            {isMember && !workshop.disabled && (
              <Button size="xs" variant="default" onClick={handleLeave} loading={leave.isPending}>
                Leave workshop
              </Button>
            )}
          </Group>
          {members.isPending && <Skeleton height={80} />}
          {members.isError && <Alert color="red">{members.error.message}</Alert>}
          {members.data && (
            <Table.ScrollContainer minWidth={520}>
              <Table verticalSpacing="sm" aria-label="Members">
                <Table.Thead>
                  <Table.Tr>
                    <Table.Th>Member</Table.Th>
                    <Table.Th>Role</Table.Th>
                    <Table.Th visibleFrom="sm">Joined</Table.Th>
                    <Table.Th />
                  </Table.Tr>
                </Table.Thead>
                <Table.Tbody>
                  {members.data.map((member) => (
                    <MemberRow key={member.userId} workshop={workshop} member={member} isMe={member.userId === user?.id} canManage={canManage} />
                  ))}
                </Table.Tbody>
              </Table>
            </Table.ScrollContainer>
          )}
        </Paper>
        {canManage && (
          <>
            <Paper withBorder p="lg" radius="md">
              <Title order={3} size="h4" mb="sm">
                Invite someone
              </Title>
              <InviteForm workshopId={workshop.id} />
            </Paper>
            <Paper withBorder p="lg" radius="md">
              <Title order={3} size="h4" mb="sm">
                Pending invitations
              </Title>
              <PendingInvitations workshopId={workshop.id} />
            </Paper>
          </>
        )}
      </Stack>
    </Stack>
  );
}

export function MembersPage({ workshopId }: { workshopId: string }) {
  return <WorkshopGate workshopId={workshopId}>{(workshop) => <Members workshop={workshop} />}</WorkshopGate>;
}
