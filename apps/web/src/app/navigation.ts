import { type Action, can, type Role } from '@gelpoint/contracts';
import { paths } from '../config/paths';

export type NavKey = 'today' | 'pieces' | 'moulds' | 'pourPlans' | 'cureBoard' | 'shelf' | 'team' | 'audit' | 'shopSettings';

export interface NavItem {
  key: NavKey;
  label: string;
  href: string;
}

const items: ReadonlyArray<NavItem & { needs?: Action }> = [
  { key: 'today', label: 'Today', href: paths.today.getHref() },
  { key: 'pieces', label: 'Pieces', href: paths.pieces.getHref() },
  { key: 'moulds', label: 'Moulds', href: paths.moulds.getHref() },
  { key: 'pourPlans', label: 'Pour plans', href: paths.pourPlans.getHref() },
  { key: 'cureBoard', label: 'Cure board', href: paths.cureBoard.getHref() },
  { key: 'shelf', label: 'Shelf', href: paths.shelf.getHref() },
  { key: 'team', label: 'Team', href: paths.team.getHref(), needs: 'team:manage' },
  { key: 'audit', label: 'Audit', href: paths.audit.getHref(), needs: 'audit:read' },
  { key: 'shopSettings', label: 'Shop settings', href: paths.shopSettings.getHref(), needs: 'shop:manage' },
];

/** The areas a role can open; the server refuses the rest anyway, so the menu does not offer them. */
export function navigationFor(role: Role): NavItem[] {
  return items.filter((item) => item.needs === undefined || can(role, item.needs)).map(({ key, label, href }) => ({ key, label, href }));
}
