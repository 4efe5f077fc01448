import type { ReactNode } from 'react';
import { Field } from '../../../components/ui/field';
import { Input, Select } from '../../../components/ui/input';

/** A labelled text box for a number as typed; its error, in plain words, sits beside it. */
export function DraftNumber({ label, value, onChange, error, unit, hint, className, width = 'w-40' }: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  error?: string | undefined;
  unit?: ReactNode;
  hint?: ReactNode;
  className?: string;
  /** width class of the whole field, unit included */
  width?: string;
}) {
  return (
    <Field label={label} unit={unit} hint={hint} error={error ? `${label} ${error}.` : undefined} className={`${width} ${className ?? ''}`}>
      <Input className="figure" inputMode="decimal" autoComplete="off" value={value} onChange={(e) => onChange(e.target.value)} />
    </Field>
  );
}

/** A labelled choice of one option of the scenario. */
export function OptionSelect({ label, value, onChange, options, error, className }: {
  label: string;
  value: string;
  onChange: (id: string) => void;
  options: Array<{ id: string; label: string }>;
  error?: string | undefined;
  className?: string;
}) {
  return (
    <Field label={label} error={error ? `${label} ${error}.` : undefined} className={className}>
      <Select value={value} onChange={(e) => onChange(e.target.value)}>
        {options.map((o) => (
          <option key={o.id} value={o.id}>{o.label}</option>
        ))}
      </Select>
    </Field>
  );
}
