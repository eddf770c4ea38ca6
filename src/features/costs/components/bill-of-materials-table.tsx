// Bills of materials side by side: quantities counted from each scenario, priced from the list.
import { PRICE_ITEM_LABELS, PRICE_ITEMS } from '../../../../shared/api/price-lists';
import type { Bill } from '../../../../shared/costs/bill-of-materials';
import { Table, Td, Th } from '../../../components/ui/table';

export interface PricedScenario {
  id: string;
  label: string;
  bill: Bill;
  /** Capital cost per part per hour of throughput; null when nothing was made. */
  perHourlyPart: number | null;
}

const whole = (value: number) => value.toLocaleString('en-GB', { maximumFractionDigits: 0 });
const quantity = (value: number, unit: string) =>
  unit === 'm' ? `${value.toLocaleString('en-GB', { maximumFractionDigits: 2 })} m` : whole(value);

export function BillOfMaterialsTable({
  scenarios,
  currency,
}: {
  scenarios: readonly PricedScenario[];
  currency: string;
}) {
  return (
    <Table caption={`Bill of materials and capital cost in ${currency}`} data-testid="bill-of-materials">
      <thead>
        <tr>
          <Th>Item</Th>
          {scenarios.map((s) => (
            <Th key={s.id} className="text-right">
              {s.label}
            </Th>
          ))}
        </tr>
      </thead>
      <tbody>
        {PRICE_ITEMS.map((item) => (
          <tr key={item}>
            <Td>{PRICE_ITEM_LABELS[item].label}</Td>
            {scenarios.map((s) => {
              const line = s.bill.lines.find((l) => l.item === item)!;
              return (
                <Td key={s.id} className="text-right tabular-nums">
                  {quantity(line.quantity, PRICE_ITEM_LABELS[item].unit)}{' '}
                  <span className="text-ink-soft">· {whole(line.total)}</span>
                </Td>
              );
            })}
          </tr>
        ))}
        <tr>
          <Td className="font-semibold">Capital cost ({currency})</Td>
          {scenarios.map((s) => (
            <Td key={s.id} className="text-right font-semibold tabular-nums">
              {whole(s.bill.capitalCost)}
            </Td>
          ))}
        </tr>
        <tr>
          <Td className="font-semibold">Per part/h of capacity ({currency})</Td>
          {scenarios.map((s) => (
            <Td key={s.id} className="text-right font-semibold tabular-nums">
              {s.perHourlyPart === null ? '—' : whole(s.perHourlyPart)}
            </Td>
          ))}
        </tr>
      </tbody>
    </Table>
  );
}
