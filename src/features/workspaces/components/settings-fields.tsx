import { Field } from '../../../components/ui/field';
import { Input, Select } from '../../../components/ui/input';
import type { UseFormReturn } from 'react-hook-form';

/** Currencies offered first; any ISO 4217 code the browser knows may be typed. */
export const COMMON_CURRENCIES = ['EUR', 'USD', 'GBP', 'CAD', 'AUD', 'NZD', 'CHF', 'SEK', 'NOK', 'DKK', 'PLN', 'CZK', 'JPY', 'ZAR'];

export interface SettingsValues {
  name: string;
  currency: string;
  unitSystem: 'si' | 'imperial';
}

/** Name, currency and unit fields shared by the create and settings forms. */
export function SettingsFields({ form, disabled }: { form: UseFormReturn<SettingsValues>; disabled?: boolean }) {
  const e = form.formState.errors;
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <Field label="Name" error={e.name?.message && `Name ${e.name.message}.`}>
        <Input disabled={disabled} {...form.register('name')} />
      </Field>
      <Field label="Currency" hint="ISO 4217 code, e.g. EUR" error={e.currency?.message && `Currency ${e.currency.message}.`}>
        <Input disabled={disabled} list="currency-codes" maxLength={3} className="uppercase" {...form.register('currency', { setValueAs: (v: string) => v.toUpperCase().trim() })} />
      </Field>
      <datalist id="currency-codes">
        {COMMON_CURRENCIES.map((c) => (
          <option key={c} value={c} />
        ))}
      </datalist>
      <Field label="Units shown" hint="Figures are stored in SI either way.">
        <Select disabled={disabled} {...form.register('unitSystem')}>
          <option value="si">SI (m, m², W)</option>
          <option value="imperial">Imperial (ft, ft², BTU/h)</option>
        </Select>
      </Field>
    </div>
  );
}
