// The studies of a project as a table: what each asks, on which scenario, how far it is.
import { Link } from 'react-router-dom';
import type { StudyListItem } from '../../../../shared/api/studies';
import { Badge } from '../../../components/ui/badge';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { KIND_LABELS, STATUS_LABELS } from '../utils/labels';

export function StudyList({ studies }: { studies: StudyListItem[] }) {
  return (
    <Table caption="Studies of this project">
      <thead>
        <tr>
          <Th>Study</Th>
          <Th>Kind</Th>
          <Th>Scenario</Th>
          <Th>Progress</Th>
          <Th>Made</Th>
        </tr>
      </thead>
      <tbody>
        {studies.map((s) => (
          <tr key={s.id}>
            <Td>
              <Link className="font-semibold text-accent-strong underline underline-offset-4" to={`/studies/${s.id}`}>
                {s.name}
              </Link>
            </Td>
            <Td>{KIND_LABELS[s.kind]}</Td>
            <Td>
              {s.scenarioName}, revision {s.revisionNumber}
            </Td>
            <Td>
              <span className="mr-2 tabular-nums">
                {s.jobsDone} / {s.jobCount} jobs
              </span>
              <Badge tone={s.status === 'done' ? 'accent' : s.status === 'running' ? 'neutral' : 'caution'}>
                {STATUS_LABELS[s.status]}
              </Badge>
            </Td>
            <Td>
              {formatDateTime(s.createdAt)} by {formatPerson(s.createdBy)}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
