import BadgeOutlined from '@mui/icons-material/BadgeOutlined';
import CalendarViewWeekOutlined from '@mui/icons-material/CalendarViewWeekOutlined';
import ListAltOutlined from '@mui/icons-material/ListAltOutlined';
import DirectionsCarOutlined from '@mui/icons-material/DirectionsCarOutlined';
import EventAvailableOutlined from '@mui/icons-material/EventAvailableOutlined';
import EventNoteOutlined from '@mui/icons-material/EventNoteOutlined';
import GarageOutlined from '@mui/icons-material/GarageOutlined';
import RuleOutlined from '@mui/icons-material/RuleOutlined';
import ScheduleOutlined from '@mui/icons-material/ScheduleOutlined';
import HandymanOutlined from '@mui/icons-material/HandymanOutlined';
import PercentOutlined from '@mui/icons-material/PercentOutlined';
import PersonAddAltOutlined from '@mui/icons-material/PersonAddAltOutlined';
import RequestQuoteOutlined from '@mui/icons-material/RequestQuoteOutlined';
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
    items.push(
      {
        label: 'Your garage',
        to: paths.account.home.getHref(),
        icon: <GarageOutlined />,
        end: true,
      },
      {
        label: 'My quotes',
        to: paths.account.quotes.getHref(),
        icon: <RequestQuoteOutlined />,
      },
      {
        label: 'My bookings',
        to: paths.account.bookings.getHref(),
        icon: <EventAvailableOutlined />,
      },
    );
  }
  const deskWork: NavItem[] = [
    { label: 'Day board', to: paths.desk.board.getHref(), icon: <CalendarViewWeekOutlined /> },
    { label: 'Bookings', to: paths.desk.bookings.getHref(), icon: <ListAltOutlined /> },
    { label: 'Walk-in quote', to: paths.desk.walkIn.getHref(), icon: <PersonAddAltOutlined /> },
    { label: 'Quotes', to: paths.desk.quotes.getHref(), icon: <RequestQuoteOutlined /> },
  ];
  if (canUseArea(role, 'desk')) {
    items.push({
      label: 'Front desk',
      to: paths.desk.home.getHref(),
      icon: <EventNoteOutlined />,
      end: true,
    });
    // The front desk's own work follows its home; a manager finds it after the Manage pages,
    // so the manager's phone bar keeps Manage, Catalogue and Vehicles in reach. The workshop's
    // hours are the desk's to read; a manager edits them under Manage → Workshop.
    if (!canUseArea(role, 'manage')) {
      items.push(...deskWork, {
        label: 'Hours & bays',
        to: paths.desk.workshop.getHref(),
        icon: <ScheduleOutlined />,
      });
    }
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
      { label: 'Policies', to: paths.manage.policies.getHref(), icon: <PercentOutlined /> },
      { label: 'Workshop', to: paths.manage.workshop.getHref(), icon: <ScheduleOutlined /> },
      { label: 'Staff', to: paths.manage.staff.getHref(), icon: <BadgeOutlined /> },
      ...deskWork,
    );
  }
  return items;
}
