import { jsPDF } from 'jspdf';
import { autoTable } from 'jspdf-autotable';
import type { Scenario } from '../../contracts/scenario';
import { safetyNotesFor } from '../../contracts/safety-notes';
import { shedFloatNoise } from '../../engine/entry-conversions';
import type { ReproduceReport } from '../../engine/reproduce';
import type { ScenarioResult } from '../../engine/result-types';
import { drawBreakdownChart, drawCumulativeChart } from './report-charts';
import { latin1, pdfMoney, pdfNumber } from './report-format';

/** What a report is built from: stored inputs and the engine's result, never figures typed by a client. */
export interface ReportInput {
  scenario: Scenario;
  result: ScenarioResult;
  notes?: string;
  /** the read-only link, when the report is of a snapshot */
  link?: string;
  /** when the report was made, ISO 8601, passed in so the builder stays free of the clock */
  generatedAt: string;
  reproduce?: ReproduceReport;
  /** one line per measurement used, e.g. "Grid, 8 × 8: mean 612 µmol/m²/s, min/mean 0.78" */
  measurements?: string[];
}

const MARGIN = 16;

/**
 * Builds the PDF report (A4, vector text and charts): title, summary, assumptions, leveling table,
 * yearly ledger per option, charts, safety notes, the link and the input hash.
 * @returns the PDF file's bytes
 */
export function buildReportPdf(input: ReportInput): Uint8Array {
  const { scenario: s, result: r } = input;
  const doc = new jsPDF({ unit: 'mm', format: 'a4' });
  const width = doc.internal.pageSize.getWidth() - 2 * MARGIN;
  const money = (v: string) => pdfMoney(v, s.currency);
  const cheapest = r.options.find((o) => o.id === r.cheapest);
  const label = (id: string) => s.options.find((o) => o.id === id)?.label ?? id;
  let y = MARGIN;

  const heading = (text: string) => {
    if (y > 260) {
      doc.addPage();
      y = MARGIN;
    }
    doc.setFont('helvetica', 'bold').setFontSize(12).setTextColor(20, 40, 55);
    doc.text(latin1(text), MARGIN, y);
    y += 6;
    doc.setFont('helvetica', 'normal').setFontSize(9).setTextColor(30, 30, 30);
  };
  const paragraph = (text: string) => {
    const lines = doc.splitTextToSize(latin1(text), width) as string[];
    doc.text(lines, MARGIN, y);
    y += lines.length * 4.2 + 2;
  };
  const table = (head: string[], body: (string | number)[][]) => {
    autoTable(doc, {
      head: [head.map(latin1)],
      body: body.map((row) => row.map((c) => latin1(String(c)))),
      startY: y,
      margin: { left: MARGIN, right: MARGIN },
      styles: { fontSize: 7.5, cellPadding: 1.2 },
      headStyles: { fillColor: [46, 74, 98] },
    });
    y = (doc as unknown as { lastAutoTable: { finalY: number } }).lastAutoTable.finalY + 6;
  };

  doc.setFont('helvetica', 'bold').setFontSize(16).setTextColor(20, 40, 55);
  const titleLines = doc.splitTextToSize(latin1(s.title), width) as string[];
  doc.text(titleLines, MARGIN, y + 2);
  y += titleLines.length * 7 + 2;
  doc.setFont('helvetica', 'normal').setFontSize(8).setTextColor(90, 90, 90);
  doc.text(latin1(`Photon Parity report, ${input.generatedAt.slice(0, 10)}; engine ${r.engineVersion}`), MARGIN, y);
  y += 8;

  heading('Summary');
  const payback = (id: string) => {
    const p = r.options.find((o) => o.id === id)?.paybackYears;
    return p === null || p === undefined ? 'no payback within the horizon' : `pays back in ${pdfNumber(p, 1)} years`;
  };
  paragraph(
    `Leveled to ${pdfNumber(r.targetPpfd)} umol/m2/s over ${pdfNumber(r.canopyAreaM2, 1)} m2 for ${pdfNumber(r.litHoursPerYear)} lit hours a year, ` +
      `the option with the lowest present value over ${s.horizonYears} years is ${label(r.cheapest)} (${money(cheapest?.totalPresentValue ?? '0')}). ` +
      (r.cheapest === s.baseline ? 'It is the baseline itself.' : `Against the baseline, ${label(s.baseline)}, it ${payback(r.cheapest)}.`),
  );
  if (input.reproduce) {
    paragraph(
      input.reproduce.reproduces
        ? `Recomputed with engine ${input.reproduce.currentEngineVersion}: the figures reproduce.`
        : `Recomputed with engine ${input.reproduce.currentEngineVersion} (stored with ${input.reproduce.storedEngineVersion}): ${input.reproduce.differences.length} figures differ.`,
    );
  }
  if (input.notes) {
    heading('Notes');
    paragraph(input.notes);
  }

  heading('Assumptions');
  const target = s.target.dli !== undefined ? `DLI ${s.target.dli} mol/m2/d` : `PPFD ${s.target.ppfd} umol/m2/s`;
  table(
    ['assumption', 'value'],
    [
      ['canopy', `${s.canopy.lengthM} m x ${s.canopy.widthM} m`],
      ['target', target],
      ['growth phases', s.schedule.map((p) => `${p.label}: ${p.hoursPerDay} h/day for ${p.daysPerYear} days`).join('; ')],
      ['leveling', `${s.levelAt} output, ${s.fixtureCount} fixture counts, utilization ${s.utilization}`],
      ['electricity', `${money(s.electricity.pricePerKwh)} per kWh, escalating ${s.electricity.escalationPctPerYear} % a year; demand ${money(s.electricity.demandChargePerKwMonth)} per kW-month`],
      ['cooling', s.cooling ? `COP ${s.cooling.cop}, removing ${shedFloatNoise(s.cooling.share * 100)} % of the lighting heat` : 'not counted'],
      ['horizon and discounting', `${s.horizonYears} years at a real discount rate of ${s.discountRatePct} %`],
      ['baseline', label(s.baseline)],
    ],
  );

  heading('Leveling and totals');
  table(
    ['option', 'fixtures (exact)', 'whole', 'PPFD', 'capital', 'total', 'present value', 'per mol', 'payback (years)'],
    r.options.map((o) => [
      `${label(o.id)}${o.id === r.cheapest ? ' (lowest)' : ''}`,
      pdfNumber(o.fixturesExact, 2),
      o.fixturesWhole,
      pdfNumber(o.achievedPpfd),
      money(o.capex),
      money(o.totalNominal),
      money(o.totalPresentValue),
      `${s.currency} ${Number(o.costPerMol).toFixed(4)}`,
      o.paybackYears === null ? '-' : pdfNumber(o.paybackYears, 2),
    ]),
  );

  heading('Cost by part over the horizon (nominal)');
  y = drawBreakdownChart(doc, r, s.currency, MARGIN, y, width);
  heading('Cumulative cost (nominal)');
  y = drawCumulativeChart(doc, r, s.currency, MARGIN, y + 3, width);

  for (const o of r.options) {
    heading(`Yearly ledger: ${label(o.id)}`);
    table(
      ['year', 'capital', 'energy', 'cooling', 'demand', 'lamps', 'total', 'cumulative'],
      o.years.map((row) => [row.year, money(row.capex), money(row.energy), money(row.cooling), money(row.demand), money(row.lamps), money(row.total), money(row.cumulative)]),
    );
  }

  if (input.measurements?.length) {
    heading('Measurements');
    for (const line of input.measurements) paragraph(line);
  }

  heading('Safety notes');
  for (const note of safetyNotesFor(s.options.map((o) => o.technology))) paragraph(`- ${note.text}`);

  heading('Reproduce these figures');
  if (input.link) paragraph(`Read-only link: ${input.link}`);
  paragraph(`Input hash (SHA-256 of the canonical scenario JSON): ${r.inputHash}`);
  paragraph('Any reader can recompute the result from the scenario file with the Photon Parity command line: npm run cli -- compute FILE --json');

  return new Uint8Array(doc.output('arraybuffer'));
}
