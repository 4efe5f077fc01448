import type { jsPDF } from 'jspdf';
import type { ScenarioResult } from '../../engine/result-types';
import { pdfMoney } from './report-format';

/** Colours of the cost parts in the PDF charts (RGB); the product's own palette. */
const PART_COLOURS: Record<string, [number, number, number]> = {
  capex: [46, 74, 98],
  energy: [201, 140, 38],
  cooling: [74, 144, 160],
  demand: [140, 104, 160],
  lamps: [120, 150, 70],
};
const LINE_COLOURS: [number, number, number][] = [[46, 74, 98], [201, 140, 38], [74, 144, 160], [140, 104, 160], [120, 150, 70], [180, 80, 70]];

/** Draws horizontal stacked bars of each option's nominal cost by part; returns the y below the chart. */
export function drawBreakdownChart(doc: jsPDF, result: ScenarioResult, currency: string, x: number, y: number, width: number): number {
  const parts = ['capex', 'energyCost', 'coolingCost', 'demandCost', 'lampCost'] as const;
  const keys = ['capex', 'energy', 'cooling', 'demand', 'lamps'];
  const max = Math.max(...result.options.map((o) => Number(o.totalNominal)), 1);
  const labelWidth = 38;
  const barWidth = width - labelWidth - 32; // room for the total printed after each bar
  doc.setFontSize(8);
  result.options.forEach((o, row) => {
    const top = y + row * 8;
    doc.setTextColor(30, 30, 30);
    doc.text(o.id, x, top + 4.5);
    let left = x + labelWidth;
    parts.forEach((part, i) => {
      const w = (Math.max(0, Number(o[part])) / max) * barWidth;
      const [r, g, b] = PART_COLOURS[keys[i]!]!;
      doc.setFillColor(r, g, b);
      if (w > 0) doc.rect(left, top, w, 6, 'F');
      left += w;
    });
    doc.text(pdfMoney(o.totalNominal, currency), left + 1.5, top + 4.5);
  });
  const legendY = y + result.options.length * 8 + 3;
  keys.forEach((key, i) => {
    const [r, g, b] = PART_COLOURS[key]!;
    doc.setFillColor(r, g, b);
    doc.rect(x + i * 32, legendY, 3, 3, 'F');
    doc.setTextColor(30, 30, 30);
    doc.text(key === 'capex' ? 'capital' : key, x + i * 32 + 4.5, legendY + 2.7);
  });
  return legendY + 8;
}

/** Draws cumulative nominal cost lines per option over the years; returns the y below the chart. */
export function drawCumulativeChart(doc: jsPDF, result: ScenarioResult, currency: string, x: number, y: number, width: number): number {
  const height = 55;
  const years = result.options[0]?.years.length ?? 1;
  const max = Math.max(...result.options.flatMap((o) => o.years.map((r) => Number(r.cumulative))), 1);
  const px = (t: number) => x + 14 + (t / Math.max(1, years - 1)) * (width - 18);
  const py = (v: number) => y + height - (v / max) * height;
  doc.setDrawColor(160, 160, 160);
  doc.setLineWidth(0.2);
  doc.line(x + 14, y, x + 14, y + height);
  doc.line(x + 14, y + height, x + width - 4, y + height);
  doc.setFontSize(7);
  doc.setTextColor(80, 80, 80);
  doc.text(pdfMoney(String(Math.round(max)), currency), x, y - 1);
  for (let t = 0; t < years; t++) doc.text(String(t), px(t) - 0.8, y + height + 4);
  doc.text('year', x + width - 10, y + height + 8);
  result.options.forEach((o, i) => {
    const [r, g, b] = LINE_COLOURS[i % LINE_COLOURS.length]!;
    doc.setDrawColor(r, g, b);
    doc.setLineWidth(0.6);
    for (let t = 1; t < o.years.length; t++) {
      doc.line(px(t - 1), py(Number(o.years[t - 1]!.cumulative)), px(t), py(Number(o.years[t]!.cumulative)));
    }
    doc.setTextColor(r, g, b);
    doc.text(o.id, x + 16 + (i % 3) * 55, y + height + 12 + Math.floor(i / 3) * 4);
  });
  return y + height + 14 + Math.ceil(result.options.length / 3) * 4;
}
