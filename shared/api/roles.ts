// Roles inside an organisation and what each may do. The server enforces
// these; the client only uses them to hide controls a user cannot use.
import { z } from 'zod';

export const roleSchema = z.enum(['owner', 'engineer', 'viewer']);
export type Role = z.infer<typeof roleSchema>;

const rank: Record<Role, number> = { viewer: 0, engineer: 1, owner: 2 };

/** True when `role` is at least as strong as `needed` (owner > engineer > viewer). */
export function roleAllows(role: Role, needed: Role): boolean {
  return rank[role] >= rank[needed];
}

export const canEdit = (role: Role) => roleAllows(role, 'engineer');
export const canManageMembers = (role: Role) => roleAllows(role, 'owner');
