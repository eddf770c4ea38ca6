// The audit page's filters: person, kind of thing, action and a date range. Applied on the server.
import { auditActionSchema, auditEntitySchema, type AuditFilter } from '../../../../shared/api/audit';
import type { UserRef } from '../../../../shared/api/common';
import { actionLabel } from './describe-entry';

const control = 'rounded-md border border-ink-faint bg-paper-raised px-2 py-1.5 font-normal';

export function AuditFilters({
  filter,
  people,
  onChange,
}: {
  filter: AuditFilter;
  people: UserRef[];
  onChange: (filter: AuditFilter) => void;
}) {
  const set = (key: keyof AuditFilter) => (event: { target: { value: string } }) =>
    onChange({ ...filter, [key]: event.target.value || undefined });
  return (
    <fieldset className="flex flex-wrap items-end gap-3">
      <legend className="sr-only">Filter the audit trail</legend>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Person
        <select className={control} value={filter.actorId ?? ''} onChange={set('actorId')}>
          <option value="">everyone</option>
          {people.map((person) => (
            <option key={person.id} value={person.id}>
              {person.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Kind
        <select className={control} value={filter.entity ?? ''} onChange={set('entity')}>
          <option value="">all kinds</option>
          {auditEntitySchema.options.map((entity) => (
            <option key={entity} value={entity}>
              {entity}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Action
        <select className={control} value={filter.action ?? ''} onChange={set('action')}>
          <option value="">all actions</option>
          {auditActionSchema.options.map((action) => (
            <option key={action} value={action}>
              {actionLabel(action)}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        From
        <input type="date" className={control} value={filter.from ?? ''} onChange={set('from')} />
      </label>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        To
        <input type="date" className={control} value={filter.to ?? ''} onChange={set('to')} />
      </label>
    </fieldset>
  );
}
