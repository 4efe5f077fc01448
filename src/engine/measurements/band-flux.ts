/**
 * Photon flux density in one band of a spectrum from the PPFD and the band's share of it, as the
 * shares are reported (per cent of the 400–700 nm photons; far-red too is a per cent of those).
 * @param ppfd PPFD over 400–700 nm, µmol m⁻² s⁻¹
 * @param sharePct the band's photons as % of the 400–700 nm photons
 * @returns µmol m⁻² s⁻¹ in the band
 */
export function bandPhotonFluxDensity(ppfd: number, sharePct: number): number {
  return (ppfd * sharePct) / 100;
}
