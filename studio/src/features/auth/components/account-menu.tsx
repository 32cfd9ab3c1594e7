import { Avatar, Button, Group, Menu, SegmentedControl, Stack, Text, UnstyledButton } from '@mantine/core';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { notifyError } from '@/lib/notify';
import { useSession, type SessionUser } from '@/lib/session';
import { useSignOut, useUpdateProfile } from '../api/mutations';

function initials(name: string): string {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((word) => word[0]?.toUpperCase())
    .join('');
}

/** The header's right side: who is signed in, their units, the way out; or the way in. */
export function AccountMenu() {
  const { user, isPending } = useSession();
  if (isPending) return null;
  if (!user) {
    return (
      <Group gap="xs">
        <Button component={Link} to={paths.signIn} variant="subtle" size="sm">
          Sign in
        </Button>
        <Button component={Link} to={paths.signUp} size="sm">
          Create account
        </Button>
      </Group>
    );
  }
  return <SignedInMenu user={user} />;
}

function SignedInMenu({ user }: { user: SessionUser }) {
  const navigate = useNavigate();
  const signOut = useSignOut();
  const updateProfile = useUpdateProfile();

  const handleUnitsChange = (preferredUnits: string) => {
    if (preferredUnits !== 'metric' && preferredUnits !== 'inch') return;
    updateProfile.mutate({ preferredUnits }, { onError: (error) => notifyError('Could not change units', error) });
  };

  const handleSignOut = () => {
    signOut.mutate(undefined, {
      onSuccess: () => navigate(paths.home),
      onError: (error) => notifyError('Could not sign out', error),
    });
  };

  return (
    <Menu position="bottom-end" width={260} withinPortal closeOnItemClick>
      <Menu.Target>
        <UnstyledButton aria-label={`Account menu for ${user.displayName}`}>
          <Group gap={8}>
            <Avatar radius="xl" size={32} color="patina">
              {initials(user.displayName)}
            </Avatar>
            <Text size="sm" fw={500} visibleFrom="sm">
              {user.displayName}
            </Text>
          </Group>
        </UnstyledButton>
      </Menu.Target>
      <Menu.Dropdown>
        <Menu.Label>
          <Stack gap={0}>
            <Text size="sm" fw={600} c="var(--mantine-color-text)">
              {user.displayName}
            </Text>
            <Text size="xs" c="dimmed">
              {user.email}
            </Text>
          </Stack>
        </Menu.Label>
        <Stack px="sm" py={6} gap={4}>
          <Text size="xs" c="dimmed">
            Show lengths in
          </Text>
          <SegmentedControl
            size="xs"
            fullWidth
            aria-label="Preferred units"
            value={user.preferredUnits}
            onChange={handleUnitsChange}
            data={[
              { value: 'metric', label: 'Millimetres' },
              { value: 'inch', label: 'Inches' },
            ]}
          />
        </Stack>
        <Menu.Divider />
        <Menu.Item component={Link} to={paths.workshops}>
          My workshops
        </Menu.Item>
        <Menu.Item component={Link} to={paths.account}>
          Account settings
        </Menu.Item>
        {user.isAdmin && (
          <Menu.Item component={Link} to={paths.adminUsers}>
            Site administration
          </Menu.Item>
        )}
        <Menu.Divider />
        <Menu.Item color="red" onClick={handleSignOut}>
          Sign out
        </Menu.Item>
      </Menu.Dropdown>
    </Menu>
  );
}
