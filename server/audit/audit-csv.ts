// The audit trail as CSV (RFC 4180 quoting). Cells that a spreadsheet would run as a formula are prefixed
// with an apostrophe, so an entity name like "=HYPERLINK(...)" stays text.
import type { AuditEntryEntity } from '../db/entities';

const HEADER = ['time', 'person', 'email', 'action', 'kind', 'id', 'details'];

function cell(value: string): string {
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

export function auditCsv(entries: AuditEntryEntity[]): string {
  const rows = entries.map((entry) => [
    entry.createdAt.toISOString(),
    entry.actor?.name ?? '',
    entry.actor?.email ?? '',
    entry.action,
    entry.entity,
    entry.entityId,
    Object.keys(entry.detail).length > 0 ? JSON.stringify(entry.detail) : '',
  ]);
  return [HEADER, ...rows].map((row) => row.map(cell).join(',')).join('\r\n') + '\r\n';
}
