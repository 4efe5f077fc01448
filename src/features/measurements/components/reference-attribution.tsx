/** Where the spectrum's reference tables come from, with their licences and how they are interpolated. */
export function ReferenceAttribution() {
  return (
    <section className="space-y-1 text-xs text-ink-soft" aria-label="Reference data">
      <p className="font-semibold text-ink">Reference data and methods</p>
      <p>
        CIE 1931 x, y use the CIE 1931 2° colour-matching functions: CIE (2019), <i>CIE 1931 colour-matching functions, 2 degree observer</i>,
        International Commission on Illumination, DOI 10.25039/CIE.DS.xvudnb9b, licensed CC BY-SA 4.0. The measured spectrum is interpolated
        linearly onto the table's 1 nm points; x, y need data from 380 to 780 nm.
      </p>
      <p>
        The yield photon flux weights photons by the relative quantum yield of McCree, K.J. (1972), <i>The action spectrum, absorptance and
        quantum yield of photosynthesis in crop plants</i>, Agricultural Meteorology 9: 191–216 (field-grown mean, Table IV), interpolated
        linearly between its 25 nm points and taken as zero outside 350–725 nm.
      </p>
      <p>
        CCT follows Ohno (2014), LEUKOS 10(1): 47–55, against a Planckian locus computed with c2 = 1.4388e-2 m·K; red : far-red is photons
        655–665 nm over 725–735 nm (Smith 1982); bands as ANSI/ASABE S640.
      </p>
    </section>
  );
}
