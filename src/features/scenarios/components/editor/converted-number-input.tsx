import { useEffect, useState } from 'react';
import type { InputHTMLAttributes, Ref } from 'react';
import { Input } from '../../../../components/ui/input';
import { toNumber } from './form-kit';

/**
 * A number input that shows a stored value in another unit (e.g. metres as feet). It keeps the typed
 * text while the person types and only rewrites it when the stored value changes from elsewhere (undo).
 */
export function ConvertedNumberInput({ value, onValue, toShown, fromShown, digits = 4, ...rest }: {
  value: number | undefined;
  onValue: (stored: number | undefined) => void;
  toShown: (stored: number) => number;
  fromShown: (shown: number) => number;
  digits?: number;
} & Omit<InputHTMLAttributes<HTMLInputElement>, 'value' | 'onChange'> & { invalid?: boolean; ref?: Ref<HTMLInputElement> }) {
  const render = (v: number | undefined) => (v === undefined || Number.isNaN(v) ? '' : String(Number(toShown(v).toFixed(digits))));
  const [text, setText] = useState(() => render(value));
  useEffect(() => {
    const typed = toNumber(text);
    const typedStored = typed === undefined || Number.isNaN(typed) ? typed : fromShown(typed);
    const same = typedStored === value || (typedStored !== undefined && value !== undefined && Math.abs(typedStored - value) < 1e-9 * Math.max(1, Math.abs(value)));
    if (!same) setText(render(value));
    // eslint-disable-next-line react-hooks/exhaustive-deps -- only a change of the stored value may rewrite the text
  }, [value]);
  return (
    <Input
      inputMode="decimal"
      autoComplete="off"
      className="figure"
      value={text}
      onChange={(e) => {
        setText(e.target.value);
        const n = toNumber(e.target.value);
        onValue(n === undefined || Number.isNaN(n) ? n : fromShown(n));
      }}
      {...rest}
    />
  );
}
