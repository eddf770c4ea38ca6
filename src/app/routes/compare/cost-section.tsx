// The costs part of a comparison: the organisation's price list and each layout's bill of materials.
import type { PriceList } from '../../../../shared/api/price-lists';
import { Section } from '../../../features/compare/components/section';
import { BillOfMaterialsTable, type PricedScenario } from '../../../features/costs/components/bill-of-materials-table';
import { PriceListCard } from '../../../features/costs/components/price-list-card';

interface CostSectionProps {
  organisationId: string;
  priceList: PriceList | null;
  scenarios: readonly PricedScenario[];
  mayEdit: boolean;
}

export function CostSection({ organisationId, priceList, scenarios, mayEdit }: CostSectionProps) {
  return (
    <>
      <PriceListCard organisationId={organisationId} priceList={priceList} mayEdit={mayEdit} />
      {priceList && scenarios.length > 0 && (
        <Section title="Bill of materials and capital cost" id="bill">
          <p className="text-sm text-ink-soft">
            Quantity · line total per layout, counted from each scenario (carriers as run)
            {priceList.invented ? '; priced with invented demo prices' : ''}.
          </p>
          <BillOfMaterialsTable scenarios={scenarios} currency={priceList.currency} />
        </Section>
      )}
    </>
  );
}
