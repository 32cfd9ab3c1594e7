import { AppShell, Burger, Group, NavLink, Text, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { Suspense } from 'react';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageLoader } from '../page-loader';

const NAVIGATION = [
  { label: 'Home', to: paths.home },
  { label: 'System status', to: paths.status },
];

export function AppLayout() {
  const [opened, { toggle, close }] = useDisclosure();
  const location = useLocation();

  return (
    <AppShell
      header={{ height: 56 }}
      navbar={{ width: 230, breakpoint: 'sm', collapsed: { mobile: !opened } }}
      padding="lg"
    >
      <AppShell.Header>
        <Group h="100%" px="md" justify="space-between">
          <Group gap="sm">
            <Burger opened={opened} onClick={toggle} hiddenFrom="sm" size="sm" aria-label="Toggle navigation" />
            <UnstyledButton component={Link} to={paths.home} aria-label="Fitwright home">
              <Group gap={8}>
                <img src="/favicon.svg" alt="" width={28} height={28} />
                <Text fw={600} size="lg">
                  Fitwright
                </Text>
              </Group>
            </UnstyledButton>
          </Group>
        </Group>
      </AppShell.Header>
      <AppShell.Navbar p="sm" aria-label="Main navigation">
        {NAVIGATION.map((item) => (
          <NavLink
            key={item.to}
            component={Link}
            to={item.to}
            label={item.label}
            active={location.pathname === item.to}
            onClick={close}
          />
        ))}
      </AppShell.Navbar>
      <AppShell.Main>
        <Suspense fallback={<PageLoader />}>
          <Outlet />
        </Suspense>
      </AppShell.Main>
    </AppShell>
  );
}
