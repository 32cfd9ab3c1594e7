import { AppShell, Burger, Group, NavLink, Text, UnstyledButton } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { Suspense, type ReactNode } from 'react';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageLoader } from '../page-loader';

const NAVIGATION = [
  { label: 'Home', to: paths.home },
  { label: 'Guides', to: paths.guideIndex },
  { label: 'Fit finder', to: paths.fitFinder },
  { label: 'System status', to: paths.status },
  { label: 'Fit calculator', to: paths.fitCalculator },
];

export interface AppLayoutProps {
  /** The header's right side (the app composes the workshop switcher and account menu here). */
  headerActions?: ReactNode;
  /** More navigation below the fixed items; `close` folds the mobile menu after a click. */
  navbarExtra?: (close: () => void) => ReactNode;
}

export function AppLayout({ headerActions, navbarExtra }: AppLayoutProps = {}) {
  const [opened, { toggle, close }] = useDisclosure();
  const location = useLocation();

  return (
    <AppShell
      header={{ height: 56 }}
      navbar={{ width: 230, breakpoint: 'sm', collapsed: { mobile: !opened } }}
      padding="lg"
    >
      <AppShell.Header>
        <Group h="100%" px="md" justify="space-between" wrap="nowrap">
          <Group gap="sm" wrap="nowrap">
            <Burger opened={opened} onClick={toggle} hiddenFrom="sm" size="sm" aria-label="Toggle navigation" />
            <UnstyledButton component={Link} to={paths.home} aria-label="Fitwright home">
              <Group gap={8}>
                <img src="/favicon.svg" alt="" width={28} height={28} />
                {/* On a phone the mark alone leaves room for the workshop switcher and account menu. */}
                <Text fw={600} size="lg" visibleFrom="xs">
                  Fitwright
                </Text>
              </Group>
            </UnstyledButton>
          </Group>
          {headerActions}
        </Group>
      </AppShell.Header>
      <AppShell.Navbar p="sm" aria-label="Main navigation">
        {NAVIGATION.map((item) => (
          <NavLink
            key={item.to}
            component={Link}
            to={item.to}
            label={item.label}
            active={location.pathname === item.to || location.pathname.startsWith(`${item.to}/`)}
            onClick={close}
          />
        ))}
        {navbarExtra?.(close)}
      </AppShell.Navbar>
      <AppShell.Main>
        <Suspense fallback={<PageLoader />}>
          <Outlet />
        </Suspense>
      </AppShell.Main>
    </AppShell>
  );
}
