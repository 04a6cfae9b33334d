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
  { label: $localize`:Main navigation entry:This week`, icon: 'calendar_view_week', link: '/' },
  {
    label: $localize`:Main navigation entry:Plan a session`,
    icon: 'add_task',
    link: '/plan/new',
    roles: ['lead', 'coach'],
  },
  { label: $localize`:Main navigation entry:Teams`, icon: 'groups', link: '/teams' },
  { label: $localize`:Main navigation entry:Activities`, icon: 'local_library', link: '/library' },
  {
    label: $localize`:Main navigation entry:Club rules`,
    icon: 'rule_settings',
    link: '/club/rules',
    roles: ['lead'],
  },
  {
    label: $localize`:Main navigation entry:Members`,
    icon: 'manage_accounts',
    link: '/club/members',
    roles: ['lead'],
  },
  {
    label: $localize`:Main navigation entry:Is Conewise working?`,
    icon: 'monitor_heart',
    link: '/status',
    roles: ['lead'],
  },
];
