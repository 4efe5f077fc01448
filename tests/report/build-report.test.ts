import { describe, expect, it } from 'vitest';
import { computeScenario } from '../../src/engine';
import { buildReportPdf } from '../../src/lib/report/build-report';
import { pdfMoney } from '../../src/lib/report/report-format';
import { pdfText } from '../support/pdf-text';
import { shippedScenario } from '../support/scenarios';

describe('PDF report', () => {
  const scenario = shippedScenario('room-a-relamp-or-replace.scenario.json');
  const result = computeScenario(scenario);
  const bytes = buildReportPdf({ scenario, result, notes: 'Prepared for the co-operative board.', link: 'http://localhost:3000/s/abc', generatedAt: '2026-12-01T12:00:00Z' });

  it('is a PDF file', () => {
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-');
  });

  it('reads back with the title, every total and present value, the hash and the link', async () => {
    const text = (await pdfText(bytes)).replace(/\s+/g, ' ');
    expect(text).toContain("Hollow Brook Growers' Co-operative, Room A");
    for (const o of result.options) {
      expect(text).toContain(pdfMoney(o.totalNominal, 'EUR'));
      expect(text).toContain(pdfMoney(o.totalPresentValue, 'EUR'));
    }
    expect(text).toContain(result.inputHash);
    expect(text).toContain('http://localhost:3000/s/abc');
    expect(text).toContain('Prepared for the co-operative board.');
  });

  it('carries the safety notes that apply to the technologies compared', async () => {
    const text = (await pdfText(bytes)).replace(/\s+/g, ' ');
    expect(text).toMatch(/ignition pulses of several kilovolts/);
    expect(text).toMatch(/mercury/);
    expect(text).toMatch(/licensed electrician/);
  });

  it('rounds money half-even to the currency minor unit for display', () => {
    expect(pdfMoney('2.345', 'EUR')).toBe('EUR 2.34');
    expect(pdfMoney('2.355', 'EUR')).toBe('EUR 2.36');
    expect(pdfMoney('1234567.5', 'JPY')).toBe('JPY 1,234,568');
  });
});
