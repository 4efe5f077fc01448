import { readPpfdGrid, readSpectrum } from '../src/engine';
import type { BenchRow, BenchSuite } from './types';
import { median, timeRuns } from './types';

/** A 5,001-row spectrum CSV: 300–800 nm every 0.1 nm, a blue pump and a broad phosphor hump in W m⁻² nm⁻¹ (synthesised). */
export function bigSpectrumCsv(): string {
  const rows = ['wavelength_nm,value'];
  for (let k = 0; k <= 5000; k++) {
    const nm = 300 + k * 0.1;
    const value = 0.5 * Math.exp(-(((nm - 450) / 12) ** 2)) + Math.exp(-(((nm - 600) / 70) ** 2));
    rows.push(`${nm.toFixed(1)},${value.toPrecision(8)}`);
  }
  return `${rows.join('\n')}\n`;
}

/** A 100 × 100 matrix of PPFD readings that fall off from the centre (synthesised). */
export function bigGridCsv(): string {
  const rows: string[] = [];
  for (let r = 0; r < 100; r++) {
    const cells: string[] = [];
    for (let c = 0; c < 100; c++) cells.push((900 - 0.05 * ((r - 49.5) ** 2 + (c - 49.5) ** 2)).toFixed(1));
    rows.push(cells.join(','));
  }
  return `${rows.join('\n')}\n`;
}

const stats = (ms: number[]) => ({ median: median(ms), worst: Math.max(...ms) });

export const measurementsSuite: BenchSuite = {
  name: 'measurements',
  async run() {
    const spectrum = bigSpectrumCsv();
    const grid = bigGridCsv();
    const readS = () => {
      if (!readSpectrum(spectrum, 'w').ok) throw new Error('bench spectrum refused');
    };
    const readG = () => {
      if (!readPpfdGrid(grid).ok) throw new Error('bench grid refused');
    };
    // the first call also builds the Planckian table of the CCT search, once per process
    const coldStart = performance.now();
    readS();
    const coldMs = performance.now() - coldStart;
    const s = stats(timeRuns(readS, 50, 5));
    const g = stats(timeRuns(readG, 50, 5));
    const rows: BenchRow[] = [
      { name: 'spectrum 5,001 rows: parse + summarise, first call', value: coldMs, unit: 'ms', target: 100, direction: 'below', note: `${(spectrum.length / 1024).toFixed(0)} KB` },
      { name: 'spectrum 5,001 rows: parse + summarise, median of 50', value: s.median, unit: 'ms', target: 100, direction: 'below', note: `worst ${s.worst.toFixed(1)} ms` },
      { name: 'grid 100 × 100: parse + summarise, median of 50', value: g.median, unit: 'ms', target: 100, direction: 'below', note: `worst ${g.worst.toFixed(1)} ms; ${(grid.length / 1024).toFixed(0)} KB` },
    ];
    return rows;
  },
};
