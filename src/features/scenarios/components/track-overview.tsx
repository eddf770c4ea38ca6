// Read-only view of the track: each deck with its lanes, then the transfers joining them.
import type { Scenario } from '../../../../shared/scenario/scenario';
import { laneLengthMm, laneModuleCount } from '../../../../shared/scenario/track';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatLengthMm } from '../../../lib/format';

const transferKindLabel = { elevator: 'Elevator', lateral: 'Lateral transfer', curve: 'Curve' } as const;

export function TrackOverview({ document }: { document: Scenario }) {
  const laneName = (id: string) => document.lanes.find((lane) => lane.id === id)?.name ?? id;
  return (
    <div className="flex flex-col gap-6">
      {document.decks.map((deck) => {
        const lanes = document.lanes.filter((lane) => lane.deckId === deck.id);
        return (
          <div key={deck.id} className="flex flex-col gap-2">
            <h4 className="font-semibold text-ink">
              {deck.name}{' '}
              <span className="font-normal text-ink-soft">· {formatLengthMm(deck.elevationMm)} above floor</span>
            </h4>
            {lanes.length === 0 ? (
              <p className="text-sm text-ink-soft">No lanes on this deck.</p>
            ) : (
              <Table caption={`Lanes on ${deck.name}`}>
                <thead>
                  <tr>
                    <Th>Lane</Th>
                    <Th className="text-right">Length</Th>
                    <Th className="text-right">Modules</Th>
                    <Th>Travels</Th>
                  </tr>
                </thead>
                <tbody>
                  {lanes.map((lane) => (
                    <tr key={lane.id}>
                      <Td className="font-medium">{lane.name}</Td>
                      <Td className="text-right tabular-nums">{formatLengthMm(laneLengthMm(lane))}</Td>
                      <Td className="text-right tabular-nums">{laneModuleCount(lane)}</Td>
                      <Td>{lane.heading}</Td>
                    </tr>
                  ))}
                </tbody>
              </Table>
            )}
          </div>
        );
      })}
      {(document.transfers.length > 0 || document.links.length > 0) && (
        <div className="flex flex-col gap-2">
          <h4 className="font-semibold text-ink">Joins between lanes</h4>
          <ul className="flex flex-col gap-1 text-sm">
            {document.transfers.map((transfer) => (
              <li key={transfer.id}>
                <span className="font-medium">{transfer.name}</span>{' '}
                <span className="text-ink-soft">
                  ({transferKindLabel[transfer.kind]}): {laneName(transfer.fromLaneId)} → {laneName(transfer.toLaneId)}
                </span>
              </li>
            ))}
            {document.links.map((link) => (
              <li key={`${link.fromLaneId}-${link.toLaneId}`} className="text-ink-soft">
                Straight run: {laneName(link.fromLaneId)} → {laneName(link.toLaneId)}
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
