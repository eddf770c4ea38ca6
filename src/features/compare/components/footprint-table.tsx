// Floor space and track of each compared layout, from its scenario document.
import type { Footprint } from '../../../../shared/costs/bill-of-materials';
import { Table, Td, Th } from '../../../components/ui/table';

const ROWS: { key: keyof Footprint; label: string; format: (v: number) => string }[] = [
  {
    key: 'areaM2',
    label: 'Floor area (bounding rectangle)',
    format: (v) => `${v.toLocaleString('en-GB', { maximumFractionDigits: 2 })} m²`,
  },
  {
    key: 'lengthM',
    label: 'Length × width',
    format: (v) => `${v.toLocaleString('en-GB', { maximumFractionDigits: 2 })} m`,
  },
  { key: 'decks', label: 'Decks', format: (v) => v.toLocaleString('en-GB') },
  {
    key: 'trackLengthM',
    label: 'Track length',
    format: (v) => `${v.toLocaleString('en-GB', { maximumFractionDigits: 2 })} m`,
  },
  { key: 'modules', label: 'Track modules', format: (v) => v.toLocaleString('en-GB') },
];

export function FootprintTable({
  items,
}: {
  items: readonly { id: string; label: string; footprint: Footprint | null }[];
}) {
  return (
    <Table caption="Footprint of each layout" data-testid="footprint-table">
      <thead>
        <tr>
          <Th>Layout</Th>
          {items.map((item) => (
            <Th key={item.id} className="text-right">
              {item.label}
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {ROWS.map((row) => (
          <tr key={row.key}>
            <Td>{row.label}</Td>
            {items.map(({ id, footprint: f }) => (
              <Td key={id} className="text-right tabular-nums">
                {!f
                  ? '—'
                  : row.key === 'lengthM'
                    ? `${row.format(f.lengthM)} × ${row.format(f.widthM)}`
                    : row.format(f[row.key])}
              </Td>
            ))}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
