import { useRef } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '../../../../app/paths';
import { useFormContext, useWatch } from 'react-hook-form';
import type { OptionInput, ScenarioInput } from '../../../../contracts/scenario';
import { Badge } from '../../../../components/ui/badge';
import { Button } from '../../../../components/ui/button';
import { TECHNOLOGY_SHORT } from '../../../../components/technology';
import { Field } from '../../../../components/ui/field';
import { Select } from '../../../../components/ui/input';
import { convertOutput, switchEntry } from '../../../../engine/entry-conversions';
import type { EntrySwitch, OutputMode } from '../../../../engine/entry-conversions';
import { MoneyField, NumberField, SelectField, TextField } from './form-kit';
import type { LibraryEntry } from './library-entry';
import { overriddenFields } from './library-entry';
import { useWorkspace } from '../../../../lib/workspace-context';

const TECH_OPTIONS = Object.entries(TECHNOLOGY_SHORT).map(([value, label]) => ({ value, label: label === 'Fluor.' ? 'Fluorescent' : label }));

/** One option of the scenario: its fixture and lamp figures, prices, and what differs from its library entry. */
export function OptionCard({ index, currency, canEdit, canRemove, onRemove, entry }: {
  index: number;
  currency: string;
  canEdit: boolean;
  canRemove: boolean;
  onRemove: () => void;
  entry: LibraryEntry | undefined;
}) {
  const { workspaceId } = useWorkspace();
  const { setValue, getValues } = useFormContext<ScenarioInput>();
  const base = `options.${index}` as const;
  const option = useWatch<ScenarioInput, `options.${number}`>({ name: base }) as OptionInput | undefined;
  const lastSwitch = useRef<EntrySwitch<OutputMode> | undefined>(undefined);
  if (!option) return null;
  const outputBy = option.ppf !== undefined ? 'ppf' : 'efficacy';
  const overrides = entry ? overriddenFields(option, entry.option) : [];
  const set = (path: string, value: unknown) => setValue(path as never, value as never, { shouldDirty: true, shouldValidate: true });

  // Switching straight back restores the figure typed, not a rounded conversion.
  const switchOutput = (next: OutputMode) => {
    if (next === outputBy) return;
    const o = getValues(base);
    const w = Number(o.wallWatts);
    const typed = outputBy === 'ppf' ? o.ppf : o.photonEfficacy;
    let value: number | undefined;
    if (typeof typed === 'number' && Number.isFinite(typed) && w > 0) {
      lastSwitch.current = switchEntry(typed, outputBy, w, convertOutput, lastSwitch.current);
      value = lastSwitch.current.converted;
    }
    set(next === 'ppf' ? `${base}.ppf` : `${base}.photonEfficacy`, value);
    set(next === 'ppf' ? `${base}.photonEfficacy` : `${base}.ppf`, undefined);
  };

  return (
    <article aria-label={`Option ${index + 1}: ${option.label || 'unnamed'}`} className="rounded-lg border border-line bg-paper/60 p-3" data-testid={`option-${index}`}>
      <div className="mb-2 flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">Option {index + 1}</h3>
        {entry ? <Badge tone="spruce" title={`From the library, figures from a ${entry.dataSource}`}>from library · {entry.dataSource}</Badge> : null}
        {entry?.measurementId ? (
          <Link className="text-sm text-spruce-700 underline" to={paths.measurement.to(workspaceId, entry.measurementId)}>the measurement and its file</Link>
        ) : null}
        {overrides.length > 0 ? <Badge tone="gold" title="These figures differ from the library entry in this scenario only">changed here: {overrides.join(', ')}</Badge> : null}
        {canEdit && canRemove ? <Button size="sm" tone="quiet" className="ml-auto" onClick={onRemove}>Remove option</Button> : null}
      </div>
      <div className="grid grid-cols-2 gap-3">
        <TextField name={`${base}.label`} label="Name" className="col-span-2" />
        <TextField name={`${base}.id`} label="Short id" hint="a–z, 0–9 and hyphens" className="col-span-2" />
        <SelectField name={`${base}.technology`} label="Technology" options={TECH_OPTIONS} />
        <NumberField name={`${base}.wallWatts`} label="Wall power" unit="W" hint="Ballast or driver included." />
        <Field label="Light output given as">
          <Select value={outputBy} onChange={(e) => switchOutput(e.target.value as OutputMode)} disabled={!canEdit}>
            <option value="efficacy">efficacy</option>
            <option value="ppf">PPF</option>
          </Select>
        </Field>
        {outputBy === 'efficacy' ? (
          <NumberField name={`${base}.photonEfficacy`} label="Photon efficacy" unit="µmol/J" />
        ) : (
          <NumberField name={`${base}.ppf`} label="PPF" unit="µmol/s" />
        )}
        <label className="col-span-2 flex items-center gap-2 text-sm">
          <input type="checkbox" disabled={!canEdit} checked={Boolean(option.owned)} onChange={(e) => set(`${base}.owned`, e.target.checked)} />
          Already installed (owned: no purchase)
        </label>
        <MoneyField name={`${base}.fixturePrice`} label="Fixture price" unit={currency} hint={option.owned ? 'Not counted: owned.' : 'Per fixture, first lamp included.'} />
        <MoneyField name={`${base}.installPrice`} label="Installation" unit={currency} hint="Per fixture." />
        <MoneyField name={`${base}.rebate`} label="Rebate" unit={currency} hint="Per fixture, at the start." />
      </div>
      <div className="mt-3 grid grid-cols-2 gap-3">
        <label className="col-span-2 flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            disabled={!canEdit}
            checked={option.lamp !== undefined}
            onChange={(e) => set(`${base}.lamp`, e.target.checked ? { price: '0', replaceEveryHours: 10000, outputAtReplacementPct: 90 } : undefined)}
          />
          Has a replaceable lamp
        </label>
        {option.lamp !== undefined ? (
          <>
            <MoneyField name={`${base}.lamp.price`} label="Lamp price" unit={currency} hint="Per replacement, per fixture." />
            <NumberField name={`${base}.lamp.replaceEveryHours`} label="Relamp every" unit="lit h" />
            <NumberField name={`${base}.lamp.outputAtReplacementPct`} label="Output before relamping" unit="% of new" />
          </>
        ) : (
          <NumberField name={`${base}.outputAtHorizonPct`} label="Output at the horizon's end" unit="% of new" />
        )}
      </div>
    </article>
  );
}
