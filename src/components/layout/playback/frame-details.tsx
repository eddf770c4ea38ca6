// Every carrier and station at the shown moment, as tables under a disclosure. Filled when the
// playback stands still (paused, scrubbed, at the end), not at 60 frames a second.
import { Table, Td, Th } from '../../ui/table';
import type { CarrierRow, StationRow } from './frame-summary';

export interface FrameDetailsData {
  clock: string;
  carriers: CarrierRow[];
  stations: StationRow[];
}

export function FrameDetails({ details }: { details: FrameDetailsData }) {
  return (
    <details className="text-sm text-ink" data-playback-details>
      <summary className="cursor-pointer font-semibold text-accent-strong">
        Every carrier and station at {details.clock}
      </summary>
      <div className="mt-2 grid gap-4 lg:grid-cols-[2fr_1fr]">
        <Table caption={`Carriers at ${details.clock}`}>
          <thead>
            <tr>
              <Th>Carrier</Th>
              <Th>Where</Th>
              <Th>Moving</Th>
              <Th>Part</Th>
            </tr>
          </thead>
          <tbody>
            {details.carriers.map((row) => (
              <tr key={row.carrier} data-playback-carrier={row.carrier}>
                <Td className="tabular-nums">{row.carrier}</Td>
                <Td>{row.where}</Td>
                <Td>{row.moving ? 'moving' : 'standing'}</Td>
                <Td>{row.loaded ? 'with a part' : 'empty'}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
        <Table caption={`Station states at ${details.clock}`}>
          <thead>
            <tr>
              <Th>Station</Th>
              <Th>State</Th>
            </tr>
          </thead>
          <tbody>
            {details.stations.map((row) => (
              <tr key={row.id} data-playback-station={row.id}>
                <Td>{row.id}</Td>
                <Td>{row.state}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      </div>
    </details>
  );
}
