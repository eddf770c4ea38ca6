// Entity → API shape helpers shared by every resource mapper.
import type { UserRef } from '../../shared/api/common';

export function toUserRef(user: { id: string; name: string; email: string } | null | undefined): UserRef | null {
  return user ? { id: user.id, name: user.name, email: user.email } : null;
}

export const iso = (date: Date): string => date.toISOString();
