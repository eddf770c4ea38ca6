// The organisation's price list as the comparison uses it, with a warning when the prices are the
// invented demo figures, and an editor for owners and engineers.
import { useState } from 'react';
import { PRICE_ITEM_LABELS, PRICE_ITEMS, type PriceList } from '../../../../shared/api/price-lists';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Card, CardTitle } from '../../../components/ui/card';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { PriceListForm } from './price-list-form';

const money = (value: number, currency: string) =>
  `${currency} ${value.toLocaleString('en-GB', { maximumFractionDigits: 2 })}`;

export function PriceListCard({
  organisationId,
  priceList,
  mayEdit,
}: {
  organisationId: string;
  priceList: PriceList | null;
  mayEdit: boolean;
}) {
  const [editing, setEditing] = useState(false);
  return (
    <Card aria-labelledby="prices-title" className="flex flex-col gap-3" data-print="keep">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div className="flex items-center gap-3">
          <CardTitle id="prices-title">Prices</CardTitle>
          {priceList?.invented && <Badge tone="caution">Invented demo prices</Badge>}
        </div>
        {mayEdit && !editing && (
          <Button variant="secondary" onClick={() => setEditing(true)} data-print="hide">
            {priceList ? 'Edit prices' : 'Enter prices'}
          </Button>
        )}
      </div>
      {editing ? (
        <PriceListForm organisationId={organisationId} current={priceList} onDone={() => setEditing(false)} />
      ) : priceList ? (
        <>
          <dl className="grid grid-cols-2 gap-x-6 gap-y-2 text-sm sm:grid-cols-4">
            {PRICE_ITEMS.map((item) => (
              <div key={item}>
                <dt className="text-ink-soft">
                  {PRICE_ITEM_LABELS[item].label}{' '}
                  <span className="text-xs">(per {PRICE_ITEM_LABELS[item].unit === 'm' ? 'metre' : 'unit'})</span>
                </dt>
                <dd className="font-semibold tabular-nums">{money(priceList.prices[item], priceList.currency)}</dd>
              </div>
            ))}
          </dl>
          {priceList.note && <p className="text-sm text-ink-soft">{priceList.note}</p>}
          <p className="text-xs text-ink-soft">
            {priceList.invented ? 'Seeded with the demo' : `Saved by ${formatPerson(priceList.updatedBy)}`} on{' '}
            {formatDateTime(priceList.updatedAt)}.
          </p>
        </>
      ) : (
        <p className="text-sm text-ink-soft">
          No prices yet:{' '}
          {mayEdit
            ? 'enter unit prices to see each layout’s capital cost and its cost per part per hour of capacity.'
            : 'an engineer or owner can enter them; costs appear here then.'}
        </p>
      )}
    </Card>
  );
}
