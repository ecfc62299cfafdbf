/** The four roles of the product, from the least to the most privileged at the counter. */
export const ROLES = ['clerk', 'technician', 'buyer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** Who may see cost and margin: never a clerk or a technician. */
export const COST_ROLES: readonly Role[] = ['buyer', 'admin'];
export const canSeeCost = (role: Role): boolean => COST_ROLES.includes(role);
