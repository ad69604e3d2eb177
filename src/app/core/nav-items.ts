import { Role } from '@shared/auth';

/** One area of the app in the navigation. */
export interface NavItem {
  label: string;
  path: string;
  icon: string;
  /** False until the area is built; unavailable areas are not shown. */
  available: boolean;
  /** Roles that see the area; null for everyone signed in. */
  roles: readonly Role[] | null;
  /** One line for the area's card on Today. */
  summary: string;
}

/** The areas of the app, in the product's order. */
export const NAV_ITEMS: readonly NavItem[] = [
  { label: 'Today', path: '/today', icon: 'today', available: true, roles: null, summary: 'Your day at the co-op.' },
  { label: 'Recipes', path: '/recipes', icon: 'menu_book', available: true, roles: null, summary: 'Recipes with live predictions.' },
  { label: 'Batches', path: '/batches', icon: 'science', available: true, roles: null, summary: 'Batches from recipe to packaging.' },
  { label: 'Gravity log', path: '/gravity-log', icon: 'water_drop', available: true, roles: null, summary: 'Gravity readings of a batch.' },
  { label: 'Strength check', path: '/strength-check', icon: 'percent', available: true, roles: null, summary: 'Strength converter, blending planner and tolerances.' },
  { label: 'Reference tables', path: '/reference-tables', icon: 'table_chart', available: true, roles: null, summary: 'Density tables: the built-in equation and uploaded tables, audited.' },
  { label: 'Kit room', path: '/kit-room', icon: 'kitchen', available: true, roles: null, summary: 'The shared kit and its bookings.' },
  { label: 'Brew plan', path: '/brew-plan', icon: 'calendar_month', available: true, roles: null, summary: 'The production calendar: batches on the fermenters, and planning the next.' },
  { label: 'Stock', path: '/stock', icon: 'inventory_2', available: true, roles: null, summary: 'Ingredient lots, what brewing draws from them, and what to buy.' },
  { label: 'Dues', path: '/dues', icon: 'payments', available: true, roles: null, summary: 'Your dues: pay by card, keep a card for renewal, see your receipts.' },
  {
    label: 'Members',
    path: '/members',
    icon: 'group',
    available: true,
    roles: ['admin'],
    summary: 'People, roles and invitations: invite new members, change roles, hand out reset links.',
  },
  {
    label: 'Outbox',
    path: '/outbox',
    icon: 'mail',
    available: true,
    roles: ['admin'],
    summary: 'Every e-mail the app writes: sent, waiting or failed, and each as it was sent.',
  },
];
