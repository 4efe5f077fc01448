import { SPECTRUM_UNITS, readSpectrum, spectrumDocument } from '../../engine';
import type { SpectrumUnit } from '../../engine';
import { InputError } from '../errors';
import { printJson, readInputFile, table } from '../io';
import { fileProblemLines } from './grid';
import type { CliCommand } from './types';

const USAGE = 'spectrum FILE --unit w|umol|relative [--json]';
const fixed = (v: number | null, digits: number, suffix = '') => (v === null ? '-' : `${v.toFixed(digits)}${suffix}`);

/** `spectrum FILE --unit w|umol|relative [--json]`: a spectrum CSV → photon-parity/spectrum@1 or a table. */
export const spectrum: CliCommand = {
  usage: USAGE,
  summary: 'PPFD, band shares, colour and yield figures of a spectrum',
  options: { unit: { type: 'string' }, json: { type: 'boolean' } },
  run({ positionals, values }) {
    const file = positionals[0];
    const unit = values.unit;
    if (typeof unit !== 'string' || !(SPECTRUM_UNITS as readonly string[]).includes(unit)) {
      throw new InputError([`--unit: must be one of ${SPECTRUM_UNITS.join(', ')} (W m⁻² nm⁻¹, µmol m⁻² s⁻¹ nm⁻¹, relative power)`]);
    }
    if (positionals.length > 1) throw new InputError([`expected one FILE, got ${positionals.length}; usage: ${USAGE}`]);
    const read = readSpectrum(readInputFile(file), unit as SpectrumUnit);
    if (!read.ok) throw new InputError(fileProblemLines(file ?? '', read.problems));
    const s = read.value;
    if (values.json) {
      printJson(spectrumDocument(s));
      return 0;
    }
    const rows: string[][] = [
      ['PPFD, 400–700 nm', s.ppfd === null ? '- (relative input)' : s.ppfd.toFixed(1), 'µmol m⁻² s⁻¹'],
      ['blue, 400–500 nm', fixed(s.sharesPct.blue, 1, ' %'), 'of PAR photons'],
      ['green, 500–600 nm', fixed(s.sharesPct.green, 1, ' %'), 'of PAR photons'],
      ['red, 600–700 nm', fixed(s.sharesPct.red, 1, ' %'), 'of PAR photons'],
      ['far-red, 700–800 nm', fixed(s.sharesPct.farRed, 1, ' %'), 'relative to PAR photons'],
      ['CIE 1931 x, y', s.cie1931 ? `${s.cie1931.x.toFixed(4)}, ${s.cie1931.y.toFixed(4)}` : '- (needs 380–780 nm)', '2° observer'],
      ['correlated colour temperature', fixed(s.cctK, 0, ' K'), s.duv === null ? 'none within |Duv| ≤ 0.05' : `Duv ${s.duv.toFixed(4)}`],
      ['yield photon flux / PPFD', fixed(s.ypfdRatio, 3), 'McCree 1972 field mean'],
      ['red : far-red', fixed(s.redFarRedRatio, 2), '655–665 nm / 725–735 nm photons'],
    ];
    const notes = s.notes.map((n) => `\nnote: ${n}`).join('');
    process.stdout.write(`${file} (${unit})\n\n${table(['figure', 'value', 'note'], rows)}\n${notes}${notes ? '\n' : ''}`);
    return 0;
  },
};
