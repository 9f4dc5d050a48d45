import type { ReactNode } from 'react';
import { AppShell } from './app-shell';
import type { NavItem } from './nav-item';

interface Props {
  navItems: readonly NavItem[];
  accountMenu: ReactNode;
  children: ReactNode;
}

/** The vehicle owner's area: a narrow column, phone first. */
export function CustomerLayout(props: Props) {
  return <AppShell contentWidth="md" {...props} />;
}
