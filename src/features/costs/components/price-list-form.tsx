// Editing the organisation's price list: one currency, one unit price per kind of equipment.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import {
  PRICE_ITEM_LABELS,
  PRICE_ITEMS,
  savePriceListSchema,
  type PriceList,
  type SavePriceListInput,
} from '../../../../shared/api/price-lists';
import { FormErrorBanner } from '../../../components/form-error-banner';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { useApiFormSubmit } from '../../../lib/use-api-form-submit';
import { useSavePriceList } from '../api/save-price-list';

const FIELDS = ['currency', 'note', ...PRICE_ITEMS.map((item) => `prices.${item}` as const)] as const;

const EMPTY: SavePriceListInput = {
  currency: 'EUR',
  prices: {
    trackPerMetre: 0,
    carrier: 0,
    elevator: 0,
    lateralTransfer: 0,
    curve: 0,
    automaticStation: 0,
    manualStation: 0,
  },
  note: '',
};

interface PriceListFormProps {
  organisationId: string;
  current: PriceList | null;
  onDone: () => void;
}

export function PriceListForm({ organisationId, current, onDone }: PriceListFormProps) {
  const form = useForm({
    resolver: zodResolver(savePriceListSchema),
    defaultValues: current
      ? { currency: current.currency, prices: current.prices, note: current.invented ? '' : current.note }
      : EMPTY,
  });
  const { errors } = form.formState;
  const save = useSavePriceList(organisationId);
  const { onSubmit, failure } = useApiFormSubmit(form, FIELDS, async (values) => {
    await save.mutateAsync(values);
    onDone();
  });

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-2" aria-label="Price list">
      <FormErrorBanner title="The prices were not saved" failure={failure} />
      <div className="grid gap-x-4 sm:grid-cols-2 lg:grid-cols-4">
        <TextField
          label="Currency"
          hint="Three capital letters, such as EUR."
          maxLength={3}
          error={errors.currency?.message}
          {...form.register('currency')}
        />
        {PRICE_ITEMS.map((item) => (
          <TextField
            key={item}
            label={`${PRICE_ITEM_LABELS[item].label} (per ${PRICE_ITEM_LABELS[item].unit === 'm' ? 'metre' : 'unit'})`}
            type="number"
            inputMode="decimal"
            step="0.01"
            min={0}
            error={errors.prices?.[item]?.message}
            {...form.register(`prices.${item}`, { valueAsNumber: true })}
          />
        ))}
      </div>
      <TextAreaField
        label="Note (optional)"
        hint="Where the prices come from and when they were quoted."
        error={errors.note?.message}
        {...form.register('note')}
      />
      <div className="mt-2 flex flex-wrap gap-3">
        <Button type="submit" pending={save.isPending} pendingLabel="Saving…">
          Save prices
        </Button>
        <Button variant="secondary" onClick={onDone} disabled={save.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
