import type { Role } from '../../../../shared/types';
import type { IconName } from '../icons/icon-names';

/** One entry of the app's main navigation. */
export interface NavItem {
  label: string;
  icon: IconName;
  link: string;
  /** Roles that see the entry; absent means every signed-in member. */
  roles?: Role[];
}

/** The main navigation, in the order a coach's week runs. */
export const NAV_ITEMS: NavItem[] = [
  { label: 'This week', icon: 'calendar_view_week', link: '/' },
  { label: 'Plan a session', icon: 'add_task', link: '/plan/new', roles: ['lead', 'coach'] },
  { label: 'Teams', icon: 'groups', link: '/teams' },
  { label: 'Activities', icon: 'local_library', link: '/library' },
  { label: 'Club rules', icon: 'rule_settings', link: '/club/rules', roles: ['lead'] },
  { label: 'Members', icon: 'manage_accounts', link: '/club/members', roles: ['lead'] },
  { label: 'Is Conewise working?', icon: 'monitor_heart', link: '/status', roles: ['lead'] },
];
