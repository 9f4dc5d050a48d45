import type { ReactNode } from 'react';
import { AppShell } from './app-shell';
import type { NavItem } from './nav-item';

interface Props {
  navItems: readonly NavItem[];
  accountMenu: ReactNode;
  children: ReactNode;
}

/** The technician's area: a single column sized for a phone or a tablet by the hoist. */
export function WorkshopLayout(props: Props) {
  return <AppShell contentWidth="md" {...props} />;
}
