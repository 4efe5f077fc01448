import { lazy, Suspense } from 'react';
import type { MeasurementData, SpectrumDocumentWire } from '../../../contracts/api/measurements';
import { LoadingState } from '../../../components/ui/states';
import { bandPhotonFluxDensity } from '../../../engine/measurements/band-flux';
import { formatNumber } from '../../../lib/format';
import { BANDS } from './bands';
import { FigureList } from './figure-list';
import { LazyDetails } from './lazy-details';
import { ReferenceAttribution } from './reference-attribution';

const SpectrumChart = lazy(() => import('./spectrum-chart'));

const share = (v: number) => `${formatNumber(v, 1)} %`;

/** A spectrum's figures, its chart with the bands shaded, the same data as tables, and the sources. */
export function SpectrumView({ spectrum: s, data, unit }: { spectrum: SpectrumDocumentWire; data: MeasurementData; unit: string | null }) {
  const relative = unit === 'relative';
  const raw = data.photons ?? [];
  const peak = raw.reduce((a, b) => Math.max(a, b), 0);
  const photons = relative && peak > 0 ? raw.map((p) => p / peak) : raw;
  const unitLabel = relative ? 'photons, relative (peak = 1)' : 'µmol m⁻² s⁻¹ nm⁻¹';
  const items = [
    { name: 'PPFD, 400–700 nm', value: s.ppfd === null ? 'not given' : `${formatNumber(s.ppfd, 1)} µmol m⁻² s⁻¹`, note: s.ppfd === null ? 'relative values give shares and ratios, not a PPFD' : undefined },
    ...BANDS.map((b) => ({ name: `${b.name} share, ${b.nm[0]}–${b.nm[1]} nm`, value: share(s.sharesPct[b.key]), note: b.key === 'farRed' ? 'as % of the 400–700 nm photons' : 'of the 400–700 nm photons' })),
    { name: 'CIE 1931 x, y', value: s.cie1931 ? `${formatNumber(s.cie1931.x, 4)}, ${formatNumber(s.cie1931.y, 4)}` : 'not given', note: s.cie1931 ? '2° observer' : 'needs data from 380 to 780 nm' },
    {
      name: 'Correlated colour temperature',
      value: s.cctK === null ? 'not given' : `${formatNumber(s.cctK, 0)} K`,
      note: s.cctK === null ? (s.cie1931 ? 'too far from the Planckian locus (|Duv| > 0.05)' : 'needs x, y') : data.duv === null ? undefined : `Duv ${formatNumber(data.duv, 4)}`,
    },
    { name: 'YPF / PPFD', value: formatNumber(s.ypfdRatio, 3), note: 'yield photon flux (McCree 1972 field mean) ÷ PPFD' },
    { name: 'Red : far-red', value: s.redFarRedRatio === null ? 'not given' : formatNumber(s.redFarRedRatio, 2), note: s.redFarRedRatio === null ? 'needs data from 655 to 735 nm with some far-red' : 'photons 655–665 nm ÷ 725–735 nm' },
  ];
  return (
    <div className="space-y-4">
      <FigureList items={items} label="Figures of the spectrum" />
      <figure>
        <figcaption className="mb-1 font-semibold">Photons per nanometre, with the blue, green, red and far-red bands shaded</figcaption>
        <Suspense fallback={<LoadingState what="Drawing the chart" />}>
          <SpectrumChart wavelengthNm={data.wavelengthNm ?? []} photons={photons} unitLabel={unitLabel} />
        </Suspense>
      </figure>
      <div className="grid gap-4 lg:grid-cols-2">
        <table className="w-full border-collapse text-sm" aria-label="Photons by band">
          <thead>
            <tr className="border-b border-line-strong text-right text-ink-soft">
              <th scope="col" className="text-left font-medium">Band</th>
              <th scope="col" className="font-medium">nm</th>
              <th scope="col" className="font-medium">Share</th>
              <th scope="col" className="font-medium">µmol m⁻² s⁻¹</th>
            </tr>
          </thead>
          <tbody>
            {BANDS.map((b) => (
              <tr key={b.key} className="border-b border-line text-right">
                <th scope="row" className="text-left font-normal"><span className="mr-1.5 inline-block size-3 rounded-sm align-middle" style={{ background: b.tint }} aria-hidden="true" />{b.name}</th>
                <td className="figure">{b.nm[0]}–{b.nm[1]}</td>
                <td className="figure">{share(s.sharesPct[b.key])}</td>
                <td className="figure">{s.ppfd === null ? '—' : formatNumber(bandPhotonFluxDensity(s.ppfd, s.sharesPct[b.key]), 1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <LazyDetails className="text-sm" summary={`The chart's data as a table (${raw.length} wavelengths)`}>
          {() => (
          <div className="mt-1 max-h-80 overflow-auto">
            <table className="w-full border-collapse" aria-label="Spectrum data">
              <thead>
                <tr className="border-b border-line-strong text-right text-ink-soft">
                  <th scope="col" className="font-medium">Wavelength, nm</th>
                  <th scope="col" className="font-medium">{unitLabel}</th>
                </tr>
              </thead>
              <tbody>
                {(data.wavelengthNm ?? []).map((nm, i) => (
                  <tr key={i} className="border-b border-line text-right">
                    <td className="figure">{formatNumber(nm, 1)}</td>
                    <td className="figure">{formatNumber(photons[i] ?? 0, 5)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          )}
        </LazyDetails>
      </div>
      <ReferenceAttribution />
    </div>
  );
}
