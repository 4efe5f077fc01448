import { get, useFormContext, useFormState } from 'react-hook-form';
import type { ReactNode } from 'react';
import type { ScenarioInput } from '../../../../contracts/scenario';
import { Field } from '../../../../components/ui/field';
import { Input, Select } from '../../../../components/ui/input';

/** Text → number for the form: empty is "not given" (undefined), a comma works as a decimal point. */
export function toNumber(v: unknown): number | undefined {
  if (typeof v === 'number') return v;
  if (typeof v !== 'string' || v.trim() === '') return undefined;
  return Number(v.trim().replace(',', '.'));
}

/** Text → amount for the form: empty is "not given" (undefined); a comma works as a decimal point. */
export function toMoneyText(v: unknown): unknown {
  if (typeof v !== 'string') return v;
  const t = v.trim().replace(',', '.');
  return t === '' ? undefined : t;
}

/** The error message at a field path, written as a sentence with the field's label. */
export function useFieldError(name: string, label: string): string | undefined {
  // Scoped to this field, so a keystroke elsewhere does not re-render every field of the form.
  const { errors } = useFormState<ScenarioInput>({ name: name as never });
  const e = get(errors, name) as { message?: string; root?: { message?: string } } | undefined;
  const message = e?.message ?? e?.root?.message;
  if (!message) return undefined;
  // Rule messages read on from the label ("Price must be …"); whole-sentence ones follow a colon.
  return /^(must|is|needs|repeats|has)\b/.test(message) ? `${label} ${message}.` : `${label}: ${message}.`;
}

interface BaseProps {
  name: string;
  label: string;
  unit?: ReactNode;
  hint?: ReactNode;
  className?: string;
}

/** A labelled number input bound to the form; its error appears beside it. */
export function NumberField({ name, label, unit, hint, className }: BaseProps) {
  const { register } = useFormContext<ScenarioInput>();
  const error = useFieldError(name, label);
  return (
    <Field label={label} unit={unit} hint={hint} error={error} className={className}>
      <Input inputMode="decimal" autoComplete="off" className="figure" {...register(name as never, { setValueAs: toNumber })} />
    </Field>
  );
}

/** A labelled amount of money, kept as decimal text so no amount passes through floating point. */
export function MoneyField({ name, label, unit, hint, className }: BaseProps) {
  const { register } = useFormContext<ScenarioInput>();
  const error = useFieldError(name, label);
  return (
    <Field label={label} unit={unit} hint={hint} error={error} className={className}>
      <Input inputMode="decimal" autoComplete="off" className="figure" {...register(name as never, { setValueAs: toMoneyText })} />
    </Field>
  );
}

/** A labelled text input bound to the form. */
export function TextField({ name, label, hint, className }: BaseProps) {
  const { register } = useFormContext<ScenarioInput>();
  const error = useFieldError(name, label);
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      <Input autoComplete="off" {...register(name as never)} />
    </Field>
  );
}

/** A labelled select bound to the form. */
export function SelectField({ name, label, hint, className, options }: BaseProps & { options: Array<{ value: string; label: string }> }) {
  const { register } = useFormContext<ScenarioInput>();
  const error = useFieldError(name, label);
  return (
    <Field label={label} hint={hint} error={error} className={className}>
      <Select {...register(name as never)}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>{o.label}</option>
        ))}
      </Select>
    </Field>
  );
}

/** A titled group of fields inside the editor. */
export function Group({ title, children, actions }: { title: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <fieldset className="rounded-lg border border-line bg-panel p-3">
      <legend className="px-1 font-semibold">{title}</legend>
      {actions ? <div className="-mt-1 mb-2 flex flex-wrap justify-end gap-2">{actions}</div> : null}
      <div className="grid gap-3">{children}</div>
    </fieldset>
  );
}
