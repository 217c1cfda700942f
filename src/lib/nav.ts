// The main navigation: which sections each person sees, by their roles.
import type { Role } from './domain';

export interface NavItem {
	href: string;
	label: string;
	roles: readonly Role[];
}

export const NAV: NavItem[] = [
	{ href: '/music', label: 'Music', roles: ['dj', 'instructor', 'organiser'] },
	{ href: '/dances', label: 'Dances', roles: ['instructor', 'dj', 'organiser', 'dancer'] },
	{ href: '/evenings', label: 'Evenings', roles: ['organiser', 'dj', 'instructor', 'dancer'] },
	// A dancer sees their own requests there, with the team's answers.
	{ href: '/requests', label: 'Requests', roles: ['organiser', 'dj', 'instructor', 'dancer'] },
	{ href: '/admin/people', label: 'People', roles: ['admin'] },
	{ href: '/admin/outbox', label: 'Outbox', roles: ['admin'] }
];

export function navFor(roles: readonly Role[]): NavItem[] {
	if (roles.includes('admin')) return NAV;
	return NAV.filter((item) => item.roles.some((r) => roles.includes(r)));
}
