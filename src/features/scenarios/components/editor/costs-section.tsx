import { useFormContext, useWatch } from 'react-hook-form';
import type { ScenarioInput } from '../../../../contracts/scenario';
import { Group, MoneyField, NumberField, SelectField } from './form-kit';

/** Tariff, cooling, horizon, discounting and how options are leveled. */
export function CostsSection({ currency, canEdit }: { currency: string; canEdit: boolean }) {
  const { setValue } = useFormContext<ScenarioInput>();
  const cooling = useWatch<ScenarioInput, 'cooling'>({ name: 'cooling' });
  return (
    <>
      <Group title="Electricity">
        <div className="grid grid-cols-2 gap-3">
          <MoneyField name="electricity.pricePerKwh" label="Price" unit={`${currency}/kWh`} />
          <NumberField name="electricity.escalationPctPerYear" label="Price rise" unit="% a year" hint="Real terms, after inflation." />
          <MoneyField name="electricity.demandChargePerKwMonth" label="Demand charge" unit={`${currency}/kW a month`} hint="0 when the tariff has none." />
        </div>
      </Group>
      <Group title="Cooling">
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            disabled={!canEdit}
            checked={cooling !== undefined}
            onChange={(e) => setValue('cooling', e.target.checked ? { cop: 3, share: 1 } : undefined, { shouldDirty: true, shouldValidate: true })}
          />
          Count the electricity the cooling needs to remove the lamps' heat
        </label>
        {cooling !== undefined ? (
          <div className="grid grid-cols-2 gap-3">
            <NumberField name="cooling.cop" label="Cooling COP" hint="Heat removed per unit of electricity." />
            <NumberField name="cooling.share" label="Share of lamp heat removed" hint="0 to 1; 1 = all of it." />
          </div>
        ) : null}
      </Group>
      <Group title="Years and money">
        <div className="grid grid-cols-2 gap-3">
          <NumberField name="horizonYears" label="Horizon" unit="years" hint="Whole years, 1 to 30." />
          <NumberField name="discountRatePct" label="Discount rate" unit="% a year" hint="Real rate; 0 = no discounting." />
        </div>
      </Group>
      <Group title="Leveling">
        <div className="grid grid-cols-2 gap-3">
          <SelectField name="fixtureCount" label="Fixture count" options={[{ value: 'exact', label: 'exact (fractional, like for like)' }, { value: 'whole', label: 'whole (rounded up, as bought)' }]} />
          <SelectField name="levelAt" label="Level at" options={[{ value: 'initial', label: 'initial output' }, { value: 'maintained', label: 'maintained output (before relamping)' }]} />
          <NumberField name="utilization" label="Photons reaching the canopy" hint="Share of fixture output, 0 to 1." />
        </div>
      </Group>
    </>
  );
}
