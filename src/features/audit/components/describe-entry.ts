// Audit rows in words: what was done, and the detail that identifies it.
import type { AuditAction, AuditEntry } from '../../../../shared/api/audit';

const verbs: Record<AuditAction, string> = {
  create: 'created',
  update: 'changed',
  delete: 'deleted',
  run: 'ran',
  restore: 'restored',
  'sign-in': 'signed in',
  'sign-in-failed': 'failed to sign in',
  'password-reset': 'reset the password',
  'password-change': 'changed the password',
  'member-add': 'joined',
  'member-update': 'changed a role',
  'member-remove': 'removed a member',
  'member-leave': 'left',
  invite: 'invited',
  'invite-resend': 'resent an invitation',
  'invite-revoke': 'revoked an invitation',
  share: 'shared',
  'share-revoke': 'withdrew a share link',
};

export const actionLabel = (action: AuditAction) => verbs[action];

/** The most telling detail of a row (a name, an e-mail, a role change), or the id. */
export function detailOf(entry: AuditEntry): string {
  const d = entry.detail;
  const text = (key: string) => (typeof d[key] === 'string' || typeof d[key] === 'number' ? String(d[key]) : undefined);
  if (text('from') && text('to')) return `${text('from')} → ${text('to')}`;
  return (
    [text('name'), text('email'), text('role'), text('number') && `revision ${text('number')}`]
      .filter(Boolean)
      .join(', ') || entry.entityId
  );
}
