import type { ReactNode } from 'react';
import { AppShell } from './app-shell';
import type { NavItem } from './nav-item';

interface Props {
  navItems: readonly NavItem[];
  accountMenu: ReactNode;
  children: ReactNode;
}

/** The front desk: the full width, for the day board's bay columns. */
export function DeskLayout(props: Props) {
  return <AppShell contentWidth="xl" {...props} />;
}
