// Marks a scenario or run that models the belt conveyor baseline, so it is never mistaken for a
// layout with independent carriers.
import { Badge } from './badge';

export const BELT_BASELINE_LABEL = 'Belt conveyor baseline';

/** `short` for lists and table cells, where the full label would crowd the row. */
export function BeltBaselineTag({ short = false }: { short?: boolean }) {
  return (
    <span data-conveyor-mode="belt" title="Pallets ride a constant-speed belt and stop and locate at each station">
      <Badge tone="caution">{short ? 'Belt baseline' : BELT_BASELINE_LABEL}</Badge>
    </span>
  );
}
