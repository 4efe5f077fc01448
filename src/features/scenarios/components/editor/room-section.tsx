import { useRef, useState } from 'react';
import { useController, useFormContext, useWatch } from 'react-hook-form';
import type { ScenarioInput } from '../../../../contracts/scenario';
import { Field } from '../../../../components/ui/field';
import { convertTarget, switchEntry } from '../../../../engine/entry-conversions';
import type { EntrySwitch, TargetMode } from '../../../../engine/entry-conversions';
import { canopyArea, dliFromPpfd, ppfdFromDli } from '../../../../engine/leveling';
import type { Dli, Hours, Ppfd } from '../../../../engine/units';
import { feetToMetres, metresToFeet, squareMetresToSquareFeet } from '../../../../engine/units-convert';
import type { UnitSystem } from '../../../../engine/units-convert';
import { formatNumber } from '../../../../lib/format';
import { ConvertedNumberInput } from './converted-number-input';
import { Group, NumberField, useFieldError } from './form-kit';

const identity = (v: number) => v;

/** The canopy input itself; Field hands it the id, description and invalid state that tie it to its label. */
function LengthInput({ name, unit, ...aria }: { name: 'canopy.lengthM' | 'canopy.widthM'; unit: 'm' | 'ft'; id?: string; 'aria-describedby'?: string; invalid?: boolean }) {
  const { field } = useController<ScenarioInput, typeof name>({ name });
  return (
    <ConvertedNumberInput
      key={unit}
      {...aria}
      name={field.name}
      ref={field.ref}
      onBlur={field.onBlur}
      value={field.value}
      onValue={field.onChange}
      toShown={unit === 'ft' ? metresToFeet : identity}
      fromShown={unit === 'ft' ? feetToMetres : identity}
    />
  );
}

function LengthField({ name, label, unit }: { name: 'canopy.lengthM' | 'canopy.widthM'; label: string; unit: 'm' | 'ft' }) {
  const error = useFieldError(name, label);
  return (
    <Field label={label} unit={unit} error={error}>
      <LengthInput name={name} unit={unit} />
    </Field>
  );
}

/** The lit canopy (in m or ft) and the light it needs, as PPFD or as DLI over one photoperiod. */
export function RoomSection({ unitSystem }: { unitSystem: UnitSystem }) {
  const { setValue, getValues } = useFormContext<ScenarioInput>();
  const [unit, setUnit] = useState<'m' | 'ft'>(unitSystem === 'imperial' ? 'ft' : 'm');
  const [length, width, target, schedule] = useWatch<ScenarioInput, ['canopy.lengthM', 'canopy.widthM', 'target', 'schedule']>({
    name: ['canopy.lengthM', 'canopy.widthM', 'target', 'schedule'],
  });
  const mode: TargetMode = target?.dli !== undefined ? 'dli' : 'ppfd';
  const lastSwitch = useRef<EntrySwitch<TargetMode> | undefined>(undefined);
  const hours = schedule?.length === 1 ? schedule[0]?.hoursPerDay : undefined;
  const area = typeof length === 'number' && typeof width === 'number' ? canopyArea({ canopy: { lengthM: length, widthM: width } }) : undefined;

  // Switching straight back restores the figure typed (295.14 stays 295.14), not a rounded conversion.
  const switchMode = (next: TargetMode) => {
    if (next === mode) return;
    const typed = getValues('target')?.[mode];
    const h = getValues('schedule')?.[0]?.hoursPerDay;
    let value: number | undefined;
    if (typeof typed === 'number' && typeof h === 'number') {
      lastSwitch.current = switchEntry(typed, mode, h, convertTarget, lastSwitch.current);
      value = lastSwitch.current.converted;
    }
    setValue('target', next === 'dli' ? { dli: value } : { ppfd: value }, { shouldValidate: true, shouldDirty: true });
  };

  return (
    <Group title="Room and light">
      <div role="radiogroup" aria-label="Canopy size in" className="flex items-center gap-3 text-sm">
        <span className="text-ink-soft">Canopy size in</span>
        {(['m', 'ft'] as const).map((u) => (
          <label key={u} className="flex items-center gap-1">
            <input type="radio" name="canopy-unit" checked={unit === u} onChange={() => setUnit(u)} /> {u === 'm' ? 'metres' : 'feet'}
          </label>
        ))}
      </div>
      <div className="grid grid-cols-2 gap-3">
        <LengthField name="canopy.lengthM" label="Canopy length" unit={unit} />
        <LengthField name="canopy.widthM" label="Canopy width" unit={unit} />
      </div>
      {area !== undefined && Number.isFinite(area) ? (
        <p className="text-sm text-ink-soft">
          Lit area <span className="figure text-ink">{formatNumber(area, 2)}</span> m² ({formatNumber(squareMetresToSquareFeet(area), 1)} ft²)
        </p>
      ) : null}
      <div role="radiogroup" aria-label="Light target given as" className="flex flex-wrap items-center gap-3 text-sm">
        <span className="text-ink-soft">Light target as</span>
        <label className="flex items-center gap-1">
          <input type="radio" name="target-mode" checked={mode === 'ppfd'} onChange={() => switchMode('ppfd')} /> PPFD
        </label>
        <label className="flex items-center gap-1">
          <input type="radio" name="target-mode" checked={mode === 'dli'} onChange={() => switchMode('dli')} /> DLI over the photoperiod
        </label>
      </div>
      {mode === 'ppfd' ? (
        <NumberField name="target.ppfd" label="Target PPFD" unit="µmol m⁻² s⁻¹" hint={typeof target?.ppfd === 'number' && typeof hours === 'number' ? `= ${formatNumber(dliFromPpfd(target.ppfd as Ppfd, hours as Hours), 1)} mol m⁻² d⁻¹ at ${hours} h a day` : 'Mean over the canopy.'} />
      ) : (
        <NumberField name="target.dli" label="Target DLI" unit="mol m⁻² d⁻¹" hint={typeof target?.dli === 'number' && typeof hours === 'number' ? `= ${formatNumber(ppfdFromDli(target.dli as Dli, hours as Hours), 0)} µmol m⁻² s⁻¹ over ${hours} h (the photoperiod of the single growth phase)` : 'Needs exactly one growth phase: its hours per day are the photoperiod.'} />
      )}
    </Group>
  );
}
