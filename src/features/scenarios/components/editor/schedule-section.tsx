import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { ScenarioInput } from '../../../../contracts/scenario';
import { Button } from '../../../../components/ui/button';
import { litHoursPerYear } from '../../../../engine/leveling';
import { formatNumber } from '../../../../lib/format';
import { Group, NumberField, TextField, useFieldError } from './form-kit';

/** Growth phases: each with its lit hours per day and days per year. */
export function ScheduleSection({ canEdit }: { canEdit: boolean }) {
  const { control } = useFormContext<ScenarioInput>();
  const { fields, append, remove } = useFieldArray({ control, name: 'schedule' });
  const rows = useWatch<ScenarioInput, 'schedule'>({ name: 'schedule' });
  const listError = useFieldError('schedule', 'The growth phases');
  // Half-typed rows count as 0 h until they hold numbers.
  const hours = litHoursPerYear({ schedule: (rows ?? []).map((r) => ({ hoursPerDay: Number(r?.hoursPerDay) || 0, daysPerYear: Number(r?.daysPerYear) || 0 })) });
  return (
    <Group
      title="Growth phases"
      actions={canEdit ? <Button size="sm" onClick={() => append({ label: `phase ${fields.length + 1}`, hoursPerDay: 18, daysPerYear: 30 })}>Add a phase</Button> : null}
    >
      {fields.map((f, i) => (
        <div key={f.id} className="grid grid-cols-[1fr_6rem_6rem_auto] items-start gap-2">
          <TextField name={`schedule.${i}.label`} label={`Phase ${i + 1}`} />
          <NumberField name={`schedule.${i}.hoursPerDay`} label="Lit hours a day" />
          <NumberField name={`schedule.${i}.daysPerYear`} label="Days a year" />
          {canEdit && fields.length > 1 ? (
            <Button size="sm" tone="quiet" className="mt-6" aria-label={`Remove phase ${i + 1}`} onClick={() => remove(i)}>Remove</Button>
          ) : <span />}
        </div>
      ))}
      {listError ? <p role="alert" className="text-sm text-danger-700">{listError}</p> : null}
      <p className="text-sm text-ink-soft">Lit hours a year: <span className="figure text-ink">{formatNumber(hours, 0)}</span> h</p>
    </Group>
  );
}
