import type { Action } from '@/lib/auth';

export interface NavItem {
  href: string;
  label: string;
  /** Shown when the member may do any of these; empty means every signed-in user. */
  anyOf: Action[];
}

/** The app's navigation, in order. The (app) layout filters it through `can`. */
export const NAV_ITEMS: NavItem[] = [
  { href: '/desk', label: 'Desk', anyOf: [] },
  { href: '/designs', label: 'Designs', anyOf: ['design.view'] },
  { href: '/desk/new', label: 'New design', anyOf: ['design.create'] },
  { href: '/fab', label: 'Fab queue', anyOf: ['revision.release', 'fabRun.record'] },
  { href: '/team', label: 'Team', anyOf: ['team.view'] },
  { href: '/reference', label: 'Language reference', anyOf: [] },
  { href: '/mailbox', label: 'Mailbox', anyOf: ['mailbox.view'] },
  { href: '/settings', label: 'Settings', anyOf: [] },
];
