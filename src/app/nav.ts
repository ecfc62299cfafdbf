import type { Role } from '@shared/roles';

/** The pages of the app and who sees them in the navigation (the API enforces the same rules). */
export interface NavItem {
  to: string;
  label: string;
  roles: readonly Role[];
}

const ALL: readonly Role[] = ['clerk', 'technician', 'buyer', 'admin'];

export const NAV_ITEMS: NavItem[] = [
  { to: '/counter', label: 'Counter', roles: ALL },
  { to: '/compare', label: 'Compare', roles: ALL },
  { to: '/bench', label: 'Bench test', roles: ['technician', 'admin'] },
  { to: '/fit-reports', label: 'Fit reports', roles: ALL },
  { to: '/price-lists', label: 'Price lists', roles: ['buyer', 'admin'] },
  { to: '/suppliers', label: 'Suppliers', roles: ['buyer', 'admin'] },
  { to: '/catalog', label: 'Catalog', roles: ['buyer', 'admin'] },
  { to: '/stores', label: 'Stores', roles: ['admin'] },
  { to: '/team', label: 'Team', roles: ['admin'] },
  { to: '/outbox', label: 'Outbox', roles: ['admin'] },
  { to: '/transfers', label: 'Transfers', roles: ['clerk', 'buyer', 'admin'] },
  { to: '/jobs', label: 'Jobs', roles: ['admin'] },
  { to: '/settings', label: 'Settings', roles: ['admin'] },
  { to: '/api-keys', label: 'API keys', roles: ['admin'] },
];

export const navFor = (role: Role): NavItem[] => NAV_ITEMS.filter((i) => i.roles.includes(role));
