import { useState } from 'react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { OptionInput, ScenarioInput } from '../../../../contracts/scenario';
import { Button } from '../../../../components/ui/button';
import { Field } from '../../../../components/ui/field';
import { Select } from '../../../../components/ui/input';
import { Group, useFieldError } from './form-kit';
import type { LibraryEntry } from './library-entry';
import { freeId, optionFields } from './library-entry';
import { OptionCard } from './option-card';

/** The options compared: added from the library or blank, edited here, and the baseline chosen among them. */
export function OptionsSection({ currency, canEdit, library }: { currency: string; canEdit: boolean; library: LibraryEntry[] | undefined }) {
  const { control, setValue, getValues } = useFormContext<ScenarioInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'options' });
  const options = useWatch<ScenarioInput, 'options'>({ name: 'options' }) ?? [];
  const [pick, setPick] = useState('');
  const baselineError = useFieldError('baseline', 'The baseline');
  const listError = useFieldError('options', 'The options');
  const byKey = new Map((library ?? []).map((e) => [e.key, e]));
  const used = () => new Set(getValues('options').map((o) => o.id));

  const add = (option: OptionInput) => append({ ...optionFields(option), id: freeId(option.id, used()) });
  const removeAt = (i: number) => {
    const removed = getValues(`options.${i}.id`);
    remove(i);
    if (getValues('baseline') === removed) setValue('baseline', getValues('options.0.id') ?? '', { shouldDirty: true, shouldValidate: true });
  };

  return (
    <Group title="Options compared">
      <Field label="Baseline (payback is measured against it)" error={baselineError}>
        <Select {...control.register('baseline')} disabled={!canEdit}>
          {options.map((o, i) => (
            <option key={fields[i]?.id ?? i} value={o?.id ?? ''}>{o?.label || o?.id || `Option ${i + 1}`}</option>
          ))}
        </Select>
      </Field>
      {fields.map((f, i) => (
        <OptionCard key={f.id} index={i} currency={currency} canEdit={canEdit} canRemove={fields.length > 1} onRemove={() => removeAt(i)} entry={byKey.get(options[i]?.id ?? '')} />
      ))}
      {listError ? <p role="alert" className="text-sm text-danger-700">{listError}</p> : null}
      {canEdit ? (
        <div className="flex flex-wrap items-end gap-2 border-t border-line pt-3">
          <Field label="Add from the fixture library" className="min-w-[16rem] flex-1">
            <Select value={pick} onChange={(e) => setPick(e.target.value)} disabled={!library || library.length === 0}>
              <option value="">{library === undefined ? 'Loading the library…' : library.length === 0 ? 'The library is empty' : 'Choose a fixture…'}</option>
              {(library ?? []).map((e) => (
                <option key={e.key} value={e.key}>{e.label} ({e.dataSource})</option>
              ))}
            </Select>
          </Field>
          <Button
            disabled={!pick || fields.length >= 24}
            onClick={() => {
              const e = byKey.get(pick);
              if (e) add(e.option);
              setPick('');
            }}
          >
            Add this fixture
          </Button>
          <Button
            tone="quiet"
            disabled={fields.length >= 24}
            onClick={() => add({ id: 'option', label: `Option ${fields.length + 1}`, technology: 'led', wallWatts: 600, photonEfficacy: 2.5, fixturePrice: '0' })}
          >
            Add a blank option
          </Button>
        </div>
      ) : null}
    </Group>
  );
}
