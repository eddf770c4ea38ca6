// The fitted candidates, best first by Kolmogorov–Smirnov D, with their parameters, p-values, notes
// and the button that makes one the station's cycle time; refused families say why.
import type { FitCandidate } from '../../../../shared/api/time-studies';
import type { Distribution } from '../../../../shared/scenario/distribution';
import { Button } from '../../../components/ui/button';
import { Table, Td, Th } from '../../../components/ui/table';
import { FAMILY_LABEL, formatValue, isFitted, parameterText } from '../utils/fit-presentation';

interface FitCandidatesTableProps {
  candidates: readonly FitCandidate[];
  canEdit: boolean;
  onUse: (distribution: Distribution) => void;
}

function formatP(p: number): string {
  return p < 0.001 ? '< 0.001' : formatValue(p);
}

export function FitCandidatesTable({ candidates, canEdit, onUse }: FitCandidatesTableProps) {
  return (
    <Table caption="Fitted distributions, best first by Kolmogorov–Smirnov D">
      <thead>
        <tr>
          <Th>Distribution</Th>
          <Th>Parameters</Th>
          <Th className="text-right">D</Th>
          <Th className="text-right">p-value</Th>
          {canEdit && <Th>Use</Th>}
        </tr>
      </thead>
      <tbody>
        {candidates.map((candidate, rank) =>
          isFitted(candidate) ? (
            <tr key={candidate.kind}>
              <Td>
                {FAMILY_LABEL[candidate.kind]}
                {rank === 0 && <span className="ml-2 text-xs font-semibold text-accent-strong">closest</span>}
              </Td>
              <Td>
                {parameterText(candidate)}
                {candidate.note && <span className="mt-1 block text-xs text-ink-soft">{candidate.note}</span>}
              </Td>
              <Td className="text-right tabular-nums">{formatValue(candidate.goodness.d)}</Td>
              <Td className="text-right tabular-nums">{formatP(candidate.goodness.pValue)}</Td>
              {canEdit && (
                <Td>
                  <Button
                    variant="secondary"
                    disabled={candidate.distribution === null}
                    onClick={() => candidate.distribution && onUse(candidate.distribution)}
                    aria-label={`Use this fit: ${FAMILY_LABEL[candidate.kind]}`}
                  >
                    Use this fit
                  </Button>
                </Td>
              )}
            </tr>
          ) : (
            <tr key={candidate.kind}>
              <Td>{FAMILY_LABEL[candidate.kind]}</Td>
              <Td colSpan={canEdit ? 4 : 3} className="text-ink-soft">
                Not fitted: {candidate.reason}.
              </Td>
            </tr>
          ),
        )}
      </tbody>
    </Table>
  );
}
