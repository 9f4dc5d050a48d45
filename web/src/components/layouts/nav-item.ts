import type { ReactElement } from 'react';

/** One destination in an area's main navigation. */
export interface NavItem {
  label: string;
  to: string;
  icon: ReactElement;
  /** Active only on exactly this path (for an area home that has pages under it in the nav). */
  end?: boolean;
}
