import type { Scenario } from '../../../../contracts/scenario';
import { Button } from '../../../../components/ui/button';
import { Input, Select } from '../../../../components/ui/input';
import { numericInputs } from '../../../../engine/sensitivity/inputs';
import type { UncertaintyRowDraft } from '../../lib/analysis-settings';
import { rowAround } from '../../lib/analysis-settings';
import type { FieldErrors } from '../../lib/draft-settings';
import { inputLabel } from '../../lib/labels';

const ENDS = [['low', 'Low'], ['likely', 'Likely'], ['high', 'High']] as const;

/** The drawn inputs: each with a low, likely and high value; errors beside the value they concern. */
export function UncertaintyInputs({ scenario, rows, onRows, errors }: {
  scenario: Scenario;
  rows: UncertaintyRowDraft[];
  onRows: (rows: UncertaintyRowDraft[]) => void;
  errors: FieldErrors;
}) {
  const catalogue = numericInputs(scenario).filter((i) => !i.bounds.integer);
  const unitOf = new Map(catalogue.map((i) => [i.path, i.unit]));
  const unused = catalogue.filter((i) => !rows.some((r) => r.path === i.path));
  const setRow = (k: number, patch: Partial<UncertaintyRowDraft>) => onRows(rows.map((r, i) => (i === k ? { ...r, ...patch } : r)));
  return (
    <div className="space-y-2">
      <table className="w-full max-w-4xl border-collapse text-sm" aria-label="Inputs drawn from ranges">
        <thead>
          <tr className="border-b border-line-strong text-left text-ink-soft">
            <th scope="col" className="font-medium">Input</th>
            {ENDS.map(([, name]) => <th key={name} scope="col" className="px-1 font-medium">{name}</th>)}
            <th scope="col"><span className="sr-only">Remove</span></th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, k) => {
            const label = inputLabel(scenario, r.path);
            const rowError = errors[`inputs[${k}].path`];
            return (
              <tr key={r.path} className="border-b border-line align-top" data-path={r.path}>
                <th scope="row" className="py-1 pr-2 text-left font-normal">
                  {label} {unitOf.get(r.path) ? <span className="text-ink-soft">({unitOf.get(r.path)})</span> : null}
                  {rowError ? <p role="alert" className="text-danger-700">{rowError}.</p> : null}
                </th>
                {ENDS.map(([key, name]) => {
                  const error = errors[`inputs[${k}].${key}`];
                  const id = `unc-${k}-${key}`;
                  return (
                    <td key={key} className="px-1 py-1">
                      <Input
                        className="figure w-24"
                        inputMode="decimal"
                        aria-label={`${label}: ${name.toLowerCase()}`}
                        aria-describedby={error ? `${id}-error` : undefined}
                        invalid={Boolean(error)}
                        value={r[key]}
                        onChange={(e) => setRow(k, { [key]: e.target.value })}
                      />
                      {error ? <p id={`${id}-error`} role="alert" className="max-w-40 text-danger-700">{name} {error}.</p> : null}
                    </td>
                  );
                })}
                <td className="py-1">
                  <Button size="sm" tone="quiet" aria-label={`Stop drawing ${label}`} onClick={() => onRows(rows.filter((_, i) => i !== k))}>Remove</Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {errors.inputs ? <p role="alert" className="text-sm text-danger-700">Inputs: {errors.inputs}.</p> : null}
      {unused.length > 0 ? (
        <label className="flex max-w-xl items-center gap-2 text-sm">
          <span className="shrink-0 text-ink-soft">Draw another input:</span>
          <Select
            value=""
            onChange={(e) => {
              const input = unused.find((i) => i.path === e.target.value);
              if (input) onRows([...rows, rowAround(input.path, input.value, 0.1, Math.max(0, Math.min(0.1, input.bounds.max / input.value - 1)))]);
            }}
          >
            <option value="">Choose an input…</option>
            {unused.map((i) => <option key={i.path} value={i.path}>{inputLabel(scenario, i.path)}</option>)}
          </Select>
        </label>
      ) : null}
    </div>
  );
}
