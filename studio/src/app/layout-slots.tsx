import { Group, NavLink } from '@mantine/core';
import { Link, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { AccountMenu } from '@/features/auth/components/account-menu';
import { HeaderSearch } from '@/features/search/components/header-search';
import { WorkshopSwitcher } from '@/features/workshops/components/workshop-switcher';
import { useSession } from '@/lib/session';

/** The header's right side: the search box, the workshop switcher and the account menu (composed here, as features do not import each other). */
export function HeaderActions() {
  return (
    <Group gap="sm" wrap="nowrap">
      <HeaderSearch />
      <WorkshopSwitcher />
      <AccountMenu />
    </Group>
  );
}

/** Navigation that depends on who is signed in. */
export function NavbarExtra({ onNavigate }: { onNavigate?: () => void }) {
  const { user } = useSession();
  const location = useLocation();
  if (!user) return null;
  const links = [
    { label: 'My workshops', to: paths.workshops },
    { label: 'Account settings', to: paths.account },
    ...(user.isAdmin
      ? [
          { label: 'Admin: users', to: paths.adminUsers },
          { label: 'Admin: workshops', to: paths.adminWorkshops },
        ]
      : []),
  ];
  return links.map((link) => (
    <NavLink key={link.to} component={Link} to={link.to} label={link.label} active={location.pathname === link.to} onClick={onNavigate} />
  ));
}
