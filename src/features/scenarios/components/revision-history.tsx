// Every saved revision of a scenario: which number, what changed, who, when.
import type { RevisionSummary } from '../../../../shared/api/scenarios';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime, formatPerson } from '../../../lib/format';

export function RevisionHistory({ revisions, latestNumber }: { revisions: RevisionSummary[]; latestNumber: number }) {
  const newestFirst = [...revisions].sort((a, b) => b.number - a.number);
  return (
    <Table caption="Revision history">
      <thead>
        <tr>
          <Th>Revision</Th>
          <Th>Note</Th>
          <Th>Saved by</Th>
          <Th>Saved</Th>
        </tr>
      </thead>
      <tbody>
        {newestFirst.map((revision) => (
          <tr key={revision.id}>
            <Td className="font-semibold whitespace-nowrap">
              #{revision.number}
              {revision.number === latestNumber && <span className="ml-2 text-xs font-medium text-accent-strong">latest</span>}
            </Td>
            <Td className="text-ink-soft">{revision.message || 'No note'}</Td>
            <Td>{formatPerson(revision.createdBy)}</Td>
            <Td className="whitespace-nowrap">
              <time dateTime={revision.createdAt}>{formatDateTime(revision.createdAt)}</time>
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
