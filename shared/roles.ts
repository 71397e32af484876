/** Staff roles, most rights first. Guests hold a link, not an account. */
export const ROLES = ['owner', 'lead', 'tech', 'support'] as const;
export type Role = (typeof ROLES)[number];

/** Role groups used by the route table; named by what they may do. */
export const ANY_STAFF: readonly Role[] = ROLES;
export const WORKSHOP: readonly Role[] = ['owner', 'lead', 'tech'];
export const AUTHORS: readonly Role[] = ['owner', 'lead'];
export const OWNERS: readonly Role[] = ['owner'];
export const LINK_SENDERS: readonly Role[] = ['owner', 'lead', 'support'];

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  lead: 'Lead technician',
  tech: 'Technician',
  support: 'Support',
};
