import { useState } from 'react';
import type { Scenario } from '../../../contracts/scenario';
import type { ScenarioResult } from '../../../engine/result-types';
import { continuousLimit, planCircuits } from '../../../engine/circuits';
import { displayHeat } from '../../../engine/units-convert';
import type { UnitSystem } from '../../../engine/units-convert';
import { SafetyNotes } from '../../../components/safety-notes';
import { Field } from '../../../components/ui/field';
import { Input, Select } from '../../../components/ui/input';
import { formatNumber } from '../../../lib/format';

const VOLTAGES = [120, 208, 230, 240, 277, 347, 400, 480];
const BREAKERS = [10, 15, 16, 20, 25, 30, 32, 40];

/**
 * Branch circuits per option at 80 % continuous load (NEC 210.19(A)(1), 210.20(A)) for a chosen
 * voltage, breaker and power factor, with the lamp heat the room must shed. A planning aid only.
 */
export function CircuitPlanner({ scenario, result, unitSystem }: { scenario: Scenario; result: ScenarioResult; unitSystem: UnitSystem }) {
  const [volts, setVolts] = useState(240);
  const [breaker, setBreaker] = useState(20);
  const [pfText, setPfText] = useState('0.95');
  const pf = Number(pfText.replace(',', '.'));
  const pfError = !(pf > 0 && pf <= 1) ? 'Power factor must be greater than 0 and at most 1.' : undefined;
  return (
    <div className="space-y-3">
      <div className="grid grid-cols-3 gap-3 sm:max-w-xl">
        <Field label="Circuit voltage" unit="V">
          <Select value={volts} onChange={(e) => setVolts(Number(e.target.value))}>
            {VOLTAGES.map((v) => <option key={v} value={v}>{v}</option>)}
          </Select>
        </Field>
        <Field label="Breaker rating" unit="A">
          <Select value={breaker} onChange={(e) => setBreaker(Number(e.target.value))}>
            {BREAKERS.map((b) => <option key={b} value={b}>{b}</option>)}
          </Select>
        </Field>
        <Field label="Power factor" error={pfError}>
          <Input inputMode="decimal" className="figure" value={pfText} onChange={(e) => setPfText(e.target.value)} />
        </Field>
      </div>
      {pfError ? null : (
        <div className="overflow-x-auto">
          <table className="w-full min-w-[40rem] border-collapse text-sm">
            <caption className="sr-only">Branch circuits per option</caption>
            <thead>
              <tr className="border-b border-line-strong text-right text-ink-soft">
                <th scope="col" className="py-1 text-left font-medium">Option</th>
                <th scope="col" className="font-medium">Current each</th>
                <th scope="col" className="font-medium">Per circuit</th>
                <th scope="col" className="font-medium">Fixtures</th>
                <th scope="col" className="font-medium">Circuits</th>
                <th scope="col" className="font-medium">Heat to remove</th>
              </tr>
            </thead>
            <tbody>
              {result.options.map((r) => {
                const o = scenario.options.find((x) => x.id === r.id);
                if (!o) return null;
                const plan = planCircuits({ wallWatts: o.wallWatts, volts, breakerAmps: breaker, powerFactor: pf }, r.fixturesUsed);
                const heat = displayHeat(plan.heatWatts, unitSystem);
                return (
                  <tr key={r.id} className="border-b border-line text-right">
                    <th scope="row" className="py-1 text-left font-normal">{o.label}</th>
                    <td className="figure">{formatNumber(plan.fixtureAmps, 2)} A</td>
                    <td className="figure">{plan.fixturesPerCircuit}</td>
                    <td className="figure">{plan.fixtures}</td>
                    <td className="figure">{plan.circuits === null ? <span className="font-sans text-danger-700">one fixture exceeds {formatNumber(plan.continuousLimitAmps, 0)} A</span> : plan.circuits}</td>
                    <td className="figure">{formatNumber(heat.value, 0)} {heat.unit}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          <p className="mt-1 text-xs text-ink-soft">
            A {breaker} A breaker carries at most {formatNumber(continuousLimit(breaker), 1)} A of continuous load (80 %, NEC 210.19(A)(1) and 210.20(A)); current each = W ÷ (V × power factor).
          </p>
        </div>
      )}
      <SafetyNotes technologies={scenario.options.map((o) => o.technology)} circuits />
    </div>
  );
}
