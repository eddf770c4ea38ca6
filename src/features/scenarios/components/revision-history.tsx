// Every saved revision of a scenario: which number, what changed, who, when; each can be opened
// read-only, and people who may edit can restore one (saved again as a new revision).
import { Link } from 'react-router-dom';
import type { RevisionSummary } from '../../../../shared/api/scenarios';
import { Button } from '../../../components/ui/button';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime, formatPerson } from '../../../lib/format';

interface RevisionHistoryProps {
  scenarioId: string;
  revisions: RevisionSummary[];
  latestNumber: number;
  /** Absent for people who may only read. */
  onRestore?: (number: number) => void;
  restoring?: number | null;
  /** Why restoring is not possible right now (e.g. an unsaved draft), shown instead of the buttons. */
  restoreBlocked?: string;
}

export function RevisionHistory({
  scenarioId,
  revisions,
  latestNumber,
  onRestore,
  restoring = null,
  restoreBlocked,
}: RevisionHistoryProps) {
  const newestFirst = [...revisions].sort((a, b) => b.number - a.number);
  return (
    <div className="flex flex-col gap-2">
      {onRestore && restoreBlocked && <p className="text-sm text-ink-soft">{restoreBlocked}</p>}
      <Table caption="Revision history">
        <thead>
          <tr>
            <Th>Revision</Th>
            <Th>Note</Th>
            <Th>Saved by</Th>
            <Th>Saved</Th>
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          </tr>
        </thead>
        <tbody>
          {newestFirst.map((revision) => (
            <tr key={revision.id}>
              <Td className="font-semibold whitespace-nowrap">
                #{revision.number}
                {revision.number === latestNumber && (
                  <span className="ml-2 text-xs font-medium text-accent-strong">latest</span>
                )}
              </Td>
              <Td className="text-ink-soft">{revision.message || 'No note'}</Td>
              <Td>{formatPerson(revision.createdBy)}</Td>
              <Td className="whitespace-nowrap">
                <time dateTime={revision.createdAt}>{formatDateTime(revision.createdAt)}</time>
              </Td>
              <Td className="whitespace-nowrap">
                <div className="flex items-center justify-end gap-3">
                  <Link
                    to={`/scenarios/${scenarioId}/revisions/${revision.number}`}
                    className="text-sm font-semibold text-accent-strong underline underline-offset-4"
                  >
                    Open<span className="sr-only"> revision {revision.number}</span>
                  </Link>
                  {onRestore && !restoreBlocked && revision.number !== latestNumber && (
                    <Button
                      variant="secondary"
                      className="min-h-8 px-2 py-1"
                      onClick={() => onRestore(revision.number)}
                      pending={restoring === revision.number}
                      pendingLabel="Restoring…"
                    >
                      Restore<span className="sr-only"> revision {revision.number}</span>
                    </Button>
                  )}
                </div>
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
    </div>
  );
}
