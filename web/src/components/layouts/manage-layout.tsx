import type { ReactNode } from 'react';
import { AppShell } from './app-shell';
import type { NavItem } from './nav-item';

interface Props {
  navItems: readonly NavItem[];
  accountMenu: ReactNode;
  children: ReactNode;
}

/** The manager's area: wide enough for catalogue and staff tables beside their forms. */
export function ManageLayout(props: Props) {
  return <AppShell contentWidth="lg" {...props} />;
}
