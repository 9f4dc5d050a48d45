import BadgeOutlined from '@mui/icons-material/BadgeOutlined';
import DirectionsCarOutlined from '@mui/icons-material/DirectionsCarOutlined';
import EventNoteOutlined from '@mui/icons-material/EventNoteOutlined';
import GarageOutlined from '@mui/icons-material/GarageOutlined';
import RuleOutlined from '@mui/icons-material/RuleOutlined';
import HandymanOutlined from '@mui/icons-material/HandymanOutlined';
import Inventory2Outlined from '@mui/icons-material/Inventory2Outlined';
import TuneOutlined from '@mui/icons-material/TuneOutlined';
import { paths } from '@/config/paths';
import { canUseArea } from '@/config/roles';
import type { Role } from '@/types/api';
import type { NavItem } from './nav-item';

/**
 * The main navigation for a role: only the areas it may use (a manager also gets the front
 * desk; the server enforces the same rule).
 */
export function navItemsForRole(role: Role): NavItem[] {
  const items: NavItem[] = [];
  if (canUseArea(role, 'account')) {
    items.push({
      label: 'Your garage',
      to: paths.account.home.getHref(),
      icon: <GarageOutlined />,
    });
  }
  if (canUseArea(role, 'desk')) {
    items.push({ label: 'Front desk', to: paths.desk.home.getHref(), icon: <EventNoteOutlined /> });
  }
  if (canUseArea(role, 'workshop')) {
    items.push({
      label: 'Workshop',
      to: paths.workshop.home.getHref(),
      icon: <HandymanOutlined />,
    });
  }
  if (canUseArea(role, 'manage')) {
    items.push(
      { label: 'Manage', to: paths.manage.home.getHref(), icon: <TuneOutlined />, end: true },
      {
        label: 'Catalogue',
        to: paths.manage.catalogue.getHref(),
        icon: <Inventory2Outlined />,
      },
      {
        label: 'Vehicles',
        to: paths.manage.vehicles.getHref(),
        icon: <DirectionsCarOutlined />,
      },
      { label: 'Rules', to: paths.manage.rules.getHref(), icon: <RuleOutlined /> },
      { label: 'Staff', to: paths.manage.staff.getHref(), icon: <BadgeOutlined /> },
    );
  }
  return items;
}
