/**
 * The method notes shown on /methods: for each quantity the formula, its assumptions and range, its
 * accuracy, the references with their provenance marks, and what is left out. The ids are the
 * anchors that the reference cases name in their `method` field.
 *
 * Formulas are small trusted HTML fragments (sub/sup and Unicode), so the page needs no script.
 */

/** How far a citation was checked (its provenance mark), as explained at the top of /methods. */
export type Mark =
  | 'confirmed'
  | 'confirmed numerically'
  | 'from memory'
  | 'common practice'
  | 'confirmed to exist'
  | 'confirmed, secondary'
  | 'confirmed, summary page'
  | 'article number confirmed by a secondary source'
  | 'reconstructed from memory; verified numerically'
  | 'title and topic confirmed; author and year from memory'
  | 'not confirmed';

export interface Citation {
  text: string;
  mark: Mark;
}

export interface MethodNote {
  id: string;
  /** further anchors that lead to this note, for reference cases that name the method more narrowly */
  aliases: string[];
  title: string;
  /** what the solver reports from this method */
  gives: string;
  /** HTML fragments, one formula per entry */
  formulas: string[];
  assumptions: string[];
  range: string;
  accuracy: string;
  references: Citation[];
  notModelled: string[];
}

export const methodNotes: MethodNote[] = [
  {
    id: 'wire',
    aliases: ['wire-awg', 'wire-resistance'],
    title: 'Wire: gauge, insulation, resistance, skin depth and mass',
    gives:
      'the bare copper diameter from the gauge, the overall diameter over the enamel (which sets the pitch of a close-wound coil), the wire length, DC resistance, AC resistance at the loaded frequency, an upper bound on Q and the copper mass',
    formulas: [
      'd<sub>n</sub> = 0.127 mm × 92<sup>(36 − n)/39</sup>  (gauge 0000 is n = −3; successive gauges differ by 92<sup>1/39</sup> ≈ 1.12293)',
      'd<sub>insulated</sub> = d<sub>bare</sub> + Δ<sub>build</sub>(n),  Δ interpolated linearly in gauge number from a table of typical single- and heavy-build increments',
      'ℓ<sub>wire</sub> = N √((π D)² + p²),  p = ℓ / N   (D at the wire centres)',
      'R<sub>dc</sub> = ρ(T) ℓ<sub>wire</sub> / (π d²/4),  ρ(T) = ρ<sub>20</sub> [1 + α<sub>20</sub>(T − 20 °C)],  ρ<sub>20</sub> = 1.7241 × 10⁻⁸ Ω·m (1/58 Ω·mm²/m), α<sub>20</sub> = 0.00393 /K',
      'δ = √(ρ / (π f μ<sub>0</sub>))  (0.2090 mm at 100 kHz for copper)',
      'R<sub>ac</sub> / R<sub>dc</sub> = Re[(ka/2) J<sub>0</sub>(ka) / J<sub>1</sub>(ka)],  k = (1 − i)/δ,  a = d/2',
      'm = 8890 kg/m³ × π d²/4 × ℓ<sub>wire</sub>;   Q ≤ 2π f L / R<sub>ac</sub>',
    ],
    assumptions: [
      'The gauge formula is the defining progression of the standard, unrounded; the standard itself tabulates diameters to at most 4 significant figures in inches.',
      'The enamel increments are typical values, between the minimum and maximum of the grades; real wire varies from reel to reel.',
      'Annealed copper at 20 °C; the skin-effect ratio is that of an isolated straight round wire.',
      'The wire length is the exact arc length of a circular helix at the wire centres; leads are not included; the enamel’s mass is neglected.',
    ],
    range:
      'Gauges 0000 (n = −3) to 56, half sizes accepted; film-build table AWG 8–40, held at its end values outside. Any positive diameter and frequency; the linear temperature law is good to about 1 % between −20 °C and 150 °C (common practice).',
    accuracy:
      'Diameter: exact by definition. Insulated diameter: a planning aid only; measure the wire or enter its insulated diameter when the winding length matters. R<sub>dc</sub>, δ and the skin-effect ratio: exact for their models. Q is an upper bound: proximity effect between turns and dielectric losses raise the real resistance.',
    references: [
      { text: 'ASTM B258, "Standard specification for standard nominal diameters and cross-sectional areas of AWG sizes of solid round wires used as electrical conductors" (B258-02 quoted on rounding to 4 significant figures)', mark: 'confirmed, secondary' },
      { text: 'ANSI/NEMA MW 1000, "Magnet Wire" (editions 2003–2015; dimension tables not read)', mark: 'confirmed to exist' },
      { text: 'IEC 60317-0-1, grades 1, 2 and 3 of enamelled round copper wire (roughly single, heavy and triple build); the increments used here', mark: 'from memory' },
      { text: 'IEC 60028 (1925), "International standard of resistance for copper": resistivity, temperature coefficient, density', mark: 'from memory' },
      { text: 'S. Ramo, J. R. Whinnery & T. Van Duzer, "Fields and Waves in Communication Electronics", 3rd ed. (1994), §3.16 skin depth, §5.13 internal impedance of a round wire', mark: 'from memory' },
      { text: 'R. G. Medhurst, "H.F. resistance and self-capacitance of single-layer solenoids", Wireless Engineer 24 (1947): the proximity factor that is not applied here', mark: 'from memory' },
    ],
    notModelled: [
      'Ovality and tolerance of the wire; gaps left by winding tension or by hand',
      'Insulation other than enamel film (served, cotton, PTFE)',
      'Proximity effect between turns (Medhurst’s factor was not available to check)',
      'Temperature rise of the winding during a run',
      'Dielectric losses in the form and the enamel; radiation resistance',
    ],
  },
  {
    id: 'secondary-inductance',
    aliases: [],
    title: 'Secondary inductance',
    gives: 'the secondary’s inductance at high frequency, with the current-sheet value and Wheeler’s as comparisons',
    formulas: [
      'L<sub>s</sub> = μ<sub>0</sub> π r² N² K<sub>L</sub> / ℓ   (Lorenz’s current sheet; r at the wire centres)',
      'K<sub>L</sub> = 4/(3π k′) · [(k′²/k²)(K(k) − E(k)) + E(k) − k],  k² = D²/(D² + ℓ²),  k′ = ℓ/√(D² + ℓ²)   (Nagaoka’s coefficient; K, E complete elliptic integrals)',
      'L = L<sub>s</sub> − μ<sub>0</sub> r N (A + B)   (Rosa’s round-wire corrections)',
      'A<sub>HF</sub> = 3/2 − ln(2p/d)  (surface current);  A<sub>LF</sub> = 5/4 − ln(2p/d)',
      'B(N) = ln(2π) − 3/2 − ln N/(6N) − 0.33084236/N − 1/(120N³) + 1/(504N⁵) − 0.0011923/N⁷ + 0.0005068/N⁹',
      'cross-check, Wheeler 1928: L[µH] = a²N²/(9a + 10b), a = radius, b = length, in inches',
      'cross-check, Wheeler 1982: L = μ<sub>0</sub> N² r {ln(1 + πr/ℓ) + 1/[2.3004 + 3.437(ℓ/D) + 1.7636(ℓ/D)² − 0.47/(0.755 + D/ℓ)<sup>1.44</sup>]}',
    ],
    assumptions: [
      'Single-layer winding of round wire with uniform pitch; current purely azimuthal (the pitch, or helicity, of the winding is neglected).',
      'The high-frequency A term is used, because the skin depth in a resonating secondary is much smaller than the wire radius.',
      'Uniform current along the winding: the low-frequency inductance, as the lumped model needs.',
    ],
    range: 'Lorenz: any D/ℓ (tested 10⁻³ to 10³). Rosa’s B: N ≥ 1. Wheeler 1928: about 1 % for b > 0.8a.',
    accuracy:
      'The current sheet is exact for its model. With Rosa’s corrections it agrees with an explicit ring-filament sum to about 0.02 % for a 12-turn helix. Close-wound secondaries: about ±0.5 % (from memory); space-wound, few-turn coils have measured about 5 % above the corrected value (builders’ reports).',
    references: [
      { text: 'L. Lorenz, "Über die Fortpflanzung der Elektrizität", Annalen der Physik und Chemie 7 (1879) 161–193', mark: 'from memory' },
      { text: 'H. Nagaoka, "The inductance coefficients of solenoids", J. College of Science, Imperial Univ. Tokyo 27 (1909) 1–33', mark: 'from memory' },
      { text: 'E. B. Rosa & F. W. Grover, "Formulas and tables for the calculation of mutual and self-inductance (revised)", Bull. Bureau of Standards 8(1) (1912), NBS Scientific Paper 169: tables of Nagaoka’s coefficient (table and page numbers not confirmed)', mark: 'from memory' },
      { text: 'E. B. Rosa, "Calculation of the self-inductance of single-layer coils", Bull. Bureau of Standards 2(2) (1906) 161–187', mark: 'from memory' },
      { text: 'F. W. Grover, "Inductance Calculations: Working Formulas and Tables" (Van Nostrand 1946): tables of the A and B corrections', mark: 'from memory' },
      { text: 'D. W. Knight, "Rosa’s mutual inductance correction for the round-wire solenoid" (2010, v1.03): the series for B, accurate to ±1.3 × 10⁻⁸ (the coefficients used here are from memory)', mark: 'confirmed, summary page' },
      { text: 'D. W. Knight, "An introduction to the art of solenoid inductance calculation, with emphasis on radio-frequency applications" (v0.20, 2016): helicity neglected by the Rosa–Nagaoka method', mark: 'confirmed to exist' },
      { text: 'H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10) (1928) 1398–1400', mark: 'from memory' },
      { text: 'J. Crabtree with D. Knight, "Wheeler’s Formulae" (2019): the inch form’s dropped 1.0027 factor', mark: 'confirmed' },
      { text: 'H. A. Wheeler, "Inductance formulas for circular and square coils", Proc. IEEE 70(12) (1982) 1449–1450', mark: 'reconstructed from memory; verified numerically' },
    ],
    notModelled: ['Helicity (pitch) of the winding', 'Non-uniform current along the winding at resonance', 'The form’s material and any metal nearby'],
  },
  {
    id: 'secondary-capacitance',
    aliases: [],
    title: 'Secondary self-capacitance',
    gives: 'the self-capacitance of the bare secondary, and whether its aspect ratio lies inside Medhurst’s table',
    formulas: [
      'C = H(ℓ/D) · D,  C in pF, D in cm  (Medhurst’s table of H, 0.96 pF/cm at ℓ/D = 0.1 down to 0.46 near ℓ/D = 1 and up to 3.40 at ℓ/D = 30; beyond, rising at the long-coil slope 4ε<sub>0</sub>/π, since the remembered rows at 40 and 50 lie below that limit)',
      'H between table entries: shape-preserving monotone cubic (PCHIP, Fritsch–Carlson) in ln(ℓ/D)',
      'cross-check, Knight: C = (4ε<sub>0</sub>ε<sub>x</sub>/π) ℓ [1 + k<sub>c</sub>(1 + ε<sub>i</sub>/ε<sub>x</sub>)/2] / cos²ψ,  k<sub>c</sub> = 0.717439(D/ℓ) + 0.933048(D/ℓ)<sup>3/2</sup> + 0.106(D/ℓ)²',
    ],
    assumptions: [
      'Single-layer solenoid, one end grounded, no topload; the lumped capacitance that resonates with the low-frequency inductance.',
      'Medhurst measured coils wound on solid polystyrene rods: a coil on a thin pipe comes out 10–30 % lower (Knight 2013), which the field model accounts for with the former\'s permittivity.',
    ],
    range: 'ℓ/D = 0.1–50. Outside it the result is flagged: above 50 H continues along the table’s last straight segment; below 0.1 it is held at 0.96, which underestimates very short coils.',
    accuracy:
      'About ±5 % (Medhurst’s own claim); the uncertainty band doubles it outside the table. For a typical aspect ratio near 5, the three estimates (Knight air core, Medhurst’s table, Medhurst’s fitted formula) spread by about 15 %.',
    references: [
      { text: 'R. G. Medhurst, "H.F. resistance and self-capacitance of single-layer solenoids", Wireless Engineer 24, no. 281 (Feb 1947) 35–43 and no. 282 (Mar 1947) 80–92 (volume, issues and starting pages confirmed by secondary quotations; about 5 % accuracy, secondary quotation)', mark: 'confirmed, secondary' },
      { text: 'Medhurst’s table, entries ℓ/D = 1.0–5.0: a 1996 transcription crediting Medhurst, pupman.com archive', mark: 'confirmed, secondary' },
      { text: 'Medhurst’s table, the other entries, as reprinted in F. Langford-Smith (ed.), "Radiotron Designer’s Handbook", 4th ed. (1953), ch. 11, pp. 451–453', mark: 'from memory' },
      { text: 'D. W. Knight, "The self-resonance and self-capacitance of solenoid coils" (v0.04, 2013), §3–§5: structure of the formula and the former’s permittivity (coefficients from memory)', mark: 'confirmed' },
      { text: 'A. J. Palermo, "Distributed capacity of single-layer coils", Proc. IRE 22 (1934) 897–905 (title confirmed; other theory for short coils)', mark: 'from memory' },
    ],
    notModelled: [
      'Dielectric of the coil form (Medhurst’s rods were polystyrene; PVC or acrylic forms differ)',
      'The secondary’s own field distribution beyond one lumped capacitance (no transmission-line model)',
      'Interaction with the topload, the primary, the strike rail and the room',
      'Turn spacing (Medhurst’s table is for close winding)',
    ],
  },
  {
    id: 'resonance',
    aliases: [],
    title: 'Resonant frequencies and the quarter-wave comparison',
    gives: 'the bare secondary’s resonance, the resonance with the topload, and the quarter-wave figure for comparison',
    formulas: [
      'f = 1 / (2π √(L C))',
      'f<sub>bare</sub> = 1 / (2π √(L C<sub>self</sub>));   f<sub>loaded</sub> = 1 / (2π √(L (C<sub>self</sub> + C<sub>topload</sub>)))',
      'f<sub>λ/4</sub> = c / (4 ℓ<sub>wire</sub>)   (comparison only)',
    ],
    assumptions: [
      'Lumped model: the secondary is its low-frequency inductance in parallel with its self-capacitance and the topload capacitance; lossless.',
      'The quarter-wave figure treats the wire as straight, which a wound secondary is not: the winding is a slow-wave structure.',
    ],
    range: 'Any positive L and C.',
    accuracy:
      'The bare-coil frequency from a current-sheet inductance and Medhurst’s capacitance is within about 5 % for typical small secondaries (builders’ reports). The quarter-wave rule is off by up to about 2× for a bare coil (about 1.7× at ℓ/D = 5).',
    references: [
      { text: 'Thomson’s formula for a lossless LC circuit (standard)', mark: 'confirmed' },
      { text: 'Tesla Coil Mailing List archive: Wheeler + Medhurst within about 5 % of measurement (1999); quarter-wave rule about 1.7× low at h/d = 5 (P. Nicholson, 2009)', mark: 'common practice' },
    ],
    notModelled: ['Transmission-line (distributed) behaviour of the secondary', 'Streamer loading (see tuning)', 'Nearby objects, people and walls, which shift the resonance'],
  },
  {
    id: 'field-model',
    aliases: ['loaded-frequency', 'distributed-model'],
    title: 'The whole resonator: field model and loaded frequency',
    gives:
      'the loaded frequency (and so the tuning target and the tap), the first three modes, the voltage along the winding, the equivalent inductance and capacitance at the top, and how much the coil and topload shield each other',
    formulas: [
      'q = P<sup>−1</sup> B V,   C = B<sup>T</sup> diag(w) P<sup>−1</sup> B   (panel potentials P with ground images; B maps node voltages to panels)',
      'M<sub>ij</sub> = ½[G(z<sub>4</sub>−z<sub>1</sub>) + G(z<sub>3</sub>−z<sub>2</sub>) − G(z<sub>3</sub>−z<sub>1</sub>) − G(z<sub>4</sub>−z<sub>2</sub>)]   (G: Lorenz sheet inductance)',
      '(D<sup>T</sup> L<sup>−1</sup> D) V = ω² C V',
      'C<sub>eff</sub> = V<sup>T</sup> C V / V<sub>top</sub>²,   L<sub>eff</sub> = 1 / (ω<sub>1</sub>² C<sub>eff</sub>)',
    ],
    assumptions: [
      'Axisymmetric and quasi-static: the winding is a smooth sheet at the wire centres whose voltage is linear within each of 20 sections; the topload is at the top voltage; the ground plane, the primary and a strike rail are grounded.',
      'The former’s dielectric enters as an effective permittivity of the inside (wall and air core in parallel), weighting the inside share of the winding’s field (D. W. Knight’s shape factor); with no former given a 3 mm PVC wall (εr 3.0) is assumed and shown.',
      'The section inductances are the current sheet’s, scaled on the diagonal so that they sum to the secondary’s round-wire inductance.',
    ],
    range: 'Any buildable design; the topload must clear the winding and the ground.',
    accuracy:
      'Converged to < 1e-3 in frequency and within 1e-4 of an independent scipy solve. Against Medhurst’s measured bare coils the winding’s own capacitance runs from +26 % (ℓ/D = 1) to −11 % (ℓ/D = 5): the band carries ±30 % on the winding’s share and ±2 % on the whole.',
    references: [
      { text: 'H. Singer, H. Steinbigler & P. Weiss, "A charge simulation method for the calculation of high voltage fields", IEEE Trans. PAS-93 (1974) 1660–1668', mark: 'from memory' },
      { text: 'J. F. Corum & K. L. Corum, "RF coils, helical resonators and voltage magnification by coherent spatial modes" (IEEE conference paper, 2001): the secondary as a loaded helical line', mark: 'from memory' },
      { text: 'D. W. Knight, "The self-resonance and self-capacitance of solenoid coils", v0.04 (2013): the former’s permittivity and Medhurst’s rods', mark: 'confirmed, summary page' },
      { text: 'R. G. Medhurst, Wireless Engineer 24 (1947): measured self-capacitance, ℓ/D 1–5', mark: 'confirmed, secondary' },
      { text: 'Independent whole-structure solve with scipy, numpy and mpmath (scripts/fixtures/field_structure.py)', mark: 'confirmed numerically' },
    ],
    notModelled: [
      'Retardation along the helix (the wave effect that makes long bare coils hold more than the quasi-static model gives)',
      'Walls, ceiling, people and other objects; the ground plane is infinite and perfect',
      'The pitch of the winding (a helix, not a sheet) and the wire’s own surface',
      'Losses: the modes are those of the lossless structure',
    ],
  },
  {
    id: 'topload-capacitance',
    aliases: [],
    title: 'Topload capacitance',
    gives: 'the capacitance of a toroid or sphere at its height above the ground plane',
    formulas: [
      'boundary elements: the generating curve of the body is cut into panels of ring charge; a ring of charge q and radius a makes the potential φ(ρ, z) = q · 2K(m) / (4π²ε<sub>0</sub>√A),  A = (ρ + a)² + (z − z′)²,  m = 4aρ/A; each ring has an opposite image below the ground plane; the charges that hold the body at 1 V sum to C',
      'sphere above ground (check): C = 4πε<sub>0</sub> a sinh α Σ<sub>n≥1</sub> 1/sinh(nα),  cosh α = h/a   (Kelvin’s images summed)',
      'isolated torus (check): C = 8ε<sub>0</sub> c Σ<sub>n≥0</sub> ε<sub>n</sub> Q<sub>n−½</sub>(cosh η<sub>0</sub>) / P<sub>n−½</sub>(cosh η<sub>0</sub>),  c = √(R² − r²),  cosh η<sub>0</sub> = R/r,  ε<sub>0</sub> = 1, ε<sub>n</sub> = 2',
      'trade’s empirical toroid formula (common practice, shown for comparison): C[pF] = 2.8 (1.2781 − d/D) √(π (D − d) d / 4),  D, d in inches',
    ],
    assumptions: [
      'An isolated conducting body of revolution, coaxial with the coil, above an infinite grounded plane at the stated ground clearance (the floor).',
      'Toroid sizes: major diameter is the overall outside diameter, minor diameter the tube diameter; R = (D − d)/2 is the centre-line radius.',
      'The secondary coil and its field are not part of the boundary problem.',
    ],
    range: 'Any toroid with outside diameter greater than twice the tube diameter, any sphere, clear of the ground plane.',
    accuracy:
      'At the default panel count the boundary-element solution is within 10⁻⁴ of the exact torus series, the sphere’s image series and 8ε<sub>0</sub>a for a disk (an independent charge-simulation computation with scipy and numpy, scripts/fixtures/worked_examples.py, agrees with the torus series and the sphere’s image series to 10⁻¹⁴ and gives 36.02267 pF for a torus R = 0.3 m, r = 0.075 m, 1.0 m above ground). Against a real room the uncertainty band allows ±5 % for surroundings (common practice). The empirical toroid formula is within about 7 % of the exact isolated torus for d/D = 0.1–0.35.',
    references: [
      { text: 'W. R. Smythe, "Static and Dynamic Electricity", 3rd ed. (McGraw-Hill 1968), ch. 5: sphere above a plane, torus', mark: 'from memory' },
      { text: 'V. Belevitch & J. Boersma, "Some electrical problems for a torus", Philips J. Res. 38 (1983) 79–137', mark: 'from memory' },
      { text: 'C. Snow, "Formulas for computing capacitance and inductance", NBS Circular 544 (1954)', mark: 'from memory' },
      { text: 'NIST Digital Library of Mathematical Functions, §14.19 toroidal functions (14.19.4, 14.19.5) and §14.5(v)', mark: 'confirmed' },
      { text: 'J. C. Maxwell, "A Treatise on Electricity and Magnetism" (1873), vol. 1: potential of a ring of charge (checked here against the on-axis limit)', mark: 'from memory' },
      { text: 'J. D. Jackson, "Classical Electrodynamics", 3rd ed., §3.13: the disk 8ε<sub>0</sub>a', mark: 'from memory' },
      { text: 'Axisymmetric boundary-element solution with a ground image, checked against all of the above and against a charge-simulation computation (ring charges with ground images; H. Singer, H. Steinbigler & P. Weiss, IEEE Trans. PAS-93, 1974) with scipy 1.17.1 and numpy (scripts/fixtures/worked_examples.py)', mark: 'confirmed numerically' },
      { text: 'Empirical toroid-topload formula circulating in the trade, without a primary physics source', mark: 'common practice' },
    ],
    notModelled: [
      'The secondary winding below the topload, which shields it and lowers what the two hold together (the field model solves both together; this figure is the topload alone)',
      'Surroundings and nearby objects: walls, ceiling, furniture, people, the strike rail',
      'Streamers and breakout (see tuning)',
      'Ground resistance: the ground plane is a perfect conductor',
    ],
  },
  {
    id: 'primary-inductance',
    aliases: ['mutual-inductance'],
    title: 'Primary inductance',
    gives: 'the inductance of a flat, helical or conical primary, with every turn or with the turns up to the tap',
    formulas: [
      'L = Σ<sub>i</sub> w<sub>i</sub>² μ<sub>0</sub> r<sub>i</sub> [ln(8r<sub>i</sub>/a) − 2] + Σ<sub>i≠j</sub> w<sub>i</sub>w<sub>j</sub> M(r<sub>i</sub>, r<sub>j</sub>, |z<sub>i</sub> − z<sub>j</sub>|)   (each turn replaced by a coaxial ring; a = conductor radius; w<sub>i</sub> = 1, or the fraction of a part turn at the tap)',
      'M(a, b, d) = μ<sub>0</sub> √(ab) [(2/k − k) K(k) − (2/k) E(k)],  k² = 4ab / ((a + b)² + d²)   (Maxwell’s coaxial filaments)',
      'single loop, high frequency: L = μ<sub>0</sub> R [ln(8R/a) − 2];  low frequency: μ<sub>0</sub> R [ln(8R/a) − 7/4]',
      'cross-check, Wheeler’s flat spiral: L[µH] = a²N² / (8a + 11c), a = mean radius, c = radial width, in inches; helical primary: Wheeler 1928 or the Rosa-corrected sheet',
    ],
    assumptions: [
      'Turns are rings at their mean radius and height: the spiral’s continuous change of radius within a turn is replaced by steps. A part turn at the tap enters as a ring weighted by its fraction.',
      'Surface current (high frequency) in each conductor; pitch = conductor diameter + spacing, along the slant for a cone.',
    ],
    range: 'Flat, helical and conical primaries; any turn count from a quarter turn; conductor radius much smaller than the turn radius.',
    accuracy:
      'The Maxwell summation is exact for filaments; the spread between the high- and low-frequency ring models and Wheeler’s spiral, about ±1.5 %, is carried into the tap band. Wheeler’s spiral itself is stated to about 5 % for c > 0.2a (from memory).',
    references: [
      { text: 'J. C. Maxwell, "A Treatise on Electricity and Magnetism" (1873), vol. 2, art. 701', mark: 'article number confirmed by a secondary source' },
      { text: 'Loop formula after Kirchhoff; Maxwell, Treatise vol. 2; Rosa & Grover 1912; Grover 1946', mark: 'from memory' },
      { text: 'F. W. Grover, "Inductance Calculations" (1946): summation of coaxial-ring mutual inductances for coils', mark: 'from memory' },
      { text: 'H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10) (1928): the flat spiral', mark: 'from memory' },
      { text: 'Ring-model worked examples (flat 52.38 µH HF, 30° cone 48.08 µH, helix 43.54 µH) computed independently with scipy 1.17.1 quadrature of Neumann’s integral (scripts/fixtures/worked_examples.py); Maxwell’s M against the same quadrature to 10⁻¹¹ (scripts/fixtures/physics_library.py)', mark: 'confirmed numerically' },
    ],
    notModelled: ['Leads to the tank and the gap, and the tap clip', 'Current crowding between neighbouring primary turns', 'Tubing wall thickness (a solid round conductor is assumed)', 'Metal near the primary, including the strike rail'],
  },
  {
    id: 'coupling',
    aliases: [],
    title: 'Coupling coefficient',
    gives: 'the mutual inductance between primary and secondary and k, with all primary turns and with the turns up to the tap',
    formulas: [
      'M<sub>ps</sub> = Σ<sub>primary rings i</sub> (N/ℓ) ∫<sub>z₀</sub><sup>z₀+ℓ</sup> M(r<sub>i</sub>, r<sub>s</sub>, |z − z<sub>i</sub>|) dz   (each primary ring against the secondary’s current sheet)',
      'k = M<sub>ps</sub> / √(L<sub>p</sub> L<sub>s</sub>)',
      'target coupling: the secondary elevation at which k equals the target, found by root-finding on the same formula',
    ],
    assumptions: ['Coaxial primary and secondary; the secondary is a uniform current sheet at its wire centres; primary turns are rings.'],
    range: 'Any coaxial geometry the primary and secondary models accept; 0 ≤ k < 1.',
    accuracy: 'Exact for rings against a uniform sheet (Maxwell’s M integrated numerically). The current along a resonating secondary is not uniform; the model does not follow that.',
    references: [
      { text: 'J. C. Maxwell, "A Treatise on Electricity and Magnetism" (1873), vol. 2, art. 701: mutual inductance of coaxial circles', mark: 'article number confirmed by a secondary source' },
      { text: 'Filament-against-sheet integral checked against nested mpmath 1.3.0 quadrature of Neumann’s integral (scripts/fixtures/physics_library.py)', mark: 'confirmed numerically' },
    ],
    notModelled: ['Non-uniform current along the secondary at resonance', 'Strike rail, metal nearby and off-axis placement', 'Frequency dependence of the primary’s current distribution'],
  },
  {
    id: 'tuning',
    aliases: ['streamer-loading'],
    title: 'Tuning and the primary tap',
    gives: 'the target frequency with a streamer allowance, the inductance the primary needs and the tap (turns from the inner end)',
    formulas: [
      'f<sub>target</sub> = 1 / (2π √(L<sub>s</sub> (C<sub>self</sub> + C<sub>topload</sub> + C<sub>streamer</sub>)))',
      'C<sub>streamer</sub> ≈ 1 pF per foot of expected streamer (range 0.8–2 pF per foot)',
      'L<sub>required</sub> = 1 / ((2π f<sub>target</sub>)² C<sub>tank</sub>)',
      'tap t: L<sub>p</sub>(t) = L<sub>required</sub>, solved by the Illinois (modified regula falsi) method on √L<sub>p</sub>(t) − √L<sub>required</sub>',
    ],
    assumptions: ['The primary circuit is tuned to the streamer-loaded secondary frequency; the tap counts turns from the inner end; more turns, more inductance.'],
    range: 'Taps from a quarter turn to every turn; outside that the tap is reported as out of range with the reason.',
    accuracy:
      'Streamer loading lowers the running frequency by about 5–8 %; builders tune about 5 % (some say 5–10 %) below the bare-secondary frequency and expect to move the tap ½–1 turn on small coils (common practice). The allowance per foot is rough.',
    references: [
      { text: 'T. Fritz, Tesla Coil Mailing List, 2002 and 2006: streamer model of about 220 kΩ and 1 pF per foot; tuned primary inductance about L<sub>s</sub>(C<sub>s</sub> + 1 pF/ft)/C<sub>p</sub>', mark: 'common practice' },
      { text: '"Spark Discharge" (CRC Press): about 1.8–1.9 pF per foot, as quoted on the Tesla Coil Mailing List, 2005', mark: 'common practice' },
      { text: 'Tuning below the bare frequency and moving the tap out ½–1 turn (Tesla Coil Mailing List, 1996 and 2006; hvtesla.com)', mark: 'common practice' },
    ],
    notModelled: ['Streamer physics: length, branching and the space-charge cloud', 'The frequency shift of the running coil with power', 'Gap and quench behaviour, which decide the real best tap'],
  },
  {
    id: 'tank-supply',
    aliases: ['tank-bank', 'transformer-capacitance', 'stored-energy'],
    title: 'Tank capacitor and supply',
    gives: 'the bank’s capacitance and voltage rating, the stored energy, a transformer’s resonant and LTR capacitance, and the power at the break rate',
    formulas: [
      'bank of equal units: C = C<sub>unit</sub> · parallel / series;  rating = V<sub>unit</sub> · series;  per-unit share = V<sub>peak</sub> / series',
      'V<sub>peak</sub> = √2 · V<sub>rms</sub> (transformer) or the bus voltage (solid state)',
      'Z = V<sub>rms</sub> / I<sub>rms</sub>;  C<sub>resonant</sub> = 1 / (2π f<sub>line</sub> Z);  C<sub>LTR</sub> = 1 / (4 f<sub>line</sub> Z) = (π/2) C<sub>resonant</sub>',
      'E = ½ C V<sub>peak</sub>²;   P = E × BPS  (BPS defaults to twice the line frequency)',
      'bleeders: about 10 MΩ, ½ W across each unit; time constant τ = R C<sub>unit</sub>, about 1 % after 4.6 τ',
    ],
    assumptions: [
      'A current-limited transformer (neon-sign type) modelled by its open-circuit voltage and short-circuit current; the gap fires at the supply peak.',
      'Equal sharing of voltage across the units of a string (bleeders enforce it at DC).',
    ],
    range: 'Transformer and solid-state supplies; any bank of equal units.',
    accuracy: 'Exact arithmetic for the idealised circuit. The real power through a gap is lower and depends on the gap (static or rotary, synchronous or not).',
    references: [
      { text: 'P. Lawrence, Tesla Coil Mailing List, 2003: resonant capacitor, 6 kV / 30 mA → 13.3 nF at 60 Hz', mark: 'common practice' },
      { text: 'B. McGuyer, "Note 1: LTR" (bartmcguyer.com): derivation of 1/(4fZ)', mark: 'common practice' },
      { text: 'R. Burnett, rotary spark gaps (richieburnett.co.uk): power = ½ × BPS × C × V²', mark: 'common practice' },
      { text: 'hvtesla.com MMC notes: series–parallel banks; T. Fritz, Tesla Coil Mailing List, 2000: 10 MΩ bleeder per capacitor', mark: 'common practice' },
      { text: 'String DC rating at least about 2× the transformer peak (no primary source found)', mark: 'common practice' },
    ],
    notModelled: ['Gap losses and quenching', 'Resonant rise and transformer saturation', 'Power factor and mains wiring', 'Protection filters and safety gaps', 'Capacitor heating and ageing'],
  },
  {
    id: 'bridge-burst',
    aliases: ['drive', 'solid-state'],
    title: 'Bridge-driven coils: the burst',
    gives:
      'for a solid-state supply: the surge impedance and frequency of the primary at the tap, the peak primary current at the end of the on-time, when the trip or the switches’ rating is reached, the tank’s peak voltage and RMS current and each capacitor’s share, the secondary’s unloaded peak voltage, the energy per burst, average power, duty cycle and bus droop',
    formulas: [
      'L<sub>1</sub> i<sub>1</sub>′ + M i<sub>2</sub>′ = v<sub>b</sub> − R<sub>1</sub> i<sub>1</sub> − q<sub>1</sub>/C<sub>1</sub>,   M i<sub>1</sub>′ + L<sub>2</sub> i<sub>2</sub>′ = −R<sub>2</sub> i<sub>2</sub> − q<sub>2</sub>/C<sub>2</sub>',
      'v<sub>b</sub> = +V while i<sub>1</sub> ≥ 0, −V while i<sub>1</sub> &lt; 0 (V = bus, or bus/2 for a half bridge), from rest at t = 0 to the on-time',
      'tap: primary + tank tuned to ratio × f<sub>target</sub>;  Z<sub>0</sub> = √(L<sub>1</sub>/C<sub>1</sub>)',
      'uncoupled, lossless check: envelope 2Vt/(πL<sub>1</sub>)',
      'each capacitor: V<sub>peak</sub>/series and I<sub>rms</sub>/parallel;  duty = on-time × rate;  P = E<sub>burst</sub> × rate',
    ],
    assumptions: [
      'The primary at the tap (its inductance, the mutual inductance to the secondary, the tank) coupled to the secondary’s equivalent L and C at the top, with the streamer allowance.',
      'Resistances: the primary conductor’s skin-effect resistance (a solid round conductor) and the secondary wire’s AC resistance; switch, capacitor and streamer losses are left out.',
      'Ideal zero-current switching: the bridge follows the sign of the primary current with no delay.',
    ],
    range: 'Dual-resonant (primary tank) and single-resonant (no tank) coils with a full or half bridge.',
    accuracy:
      'The integration is checked against the closed-form envelope and an independent scipy integration (see /validation). The secondary voltage is an upper bound: streamers load the secondary and lower it.',
    references: [
      { text: 'Series RLC driven at resonance by a square wave: fundamental 4V/π, envelope 2Vt/(πL) (any circuits text)', mark: 'confirmed numerically' },
      { text: 'Primary tuned below the secondary, about 0.85–0.95 × (builders of dual-resonant coils)', mark: 'common practice' },
      { text: 'Current-transformer ratios and trip practice of bridge-driven coils', mark: 'common practice' },
    ],
    notModelled: ['Streamer load and its frequency pull', 'Switching losses, dead time and feedback delay', 'Capacitor ESR and heating', 'Bus ripple from the rectifier and the mains'],
  },
  {
    id: 'spark-length',
    aliases: [],
    title: 'Spark length',
    gives: 'a rough spark length for a spark-gap coil, and from it the perimeter on the event sheet',
    formulas: ['L<sub>spark</sub>[in] ≈ 1.7 √(P[W])   (1 kW → about 54 in, 1.37 m)', 'P = the smaller of the transformer’s rated power V·I and the power at the break rate'],
    assumptions: ['Spark-gap coils fed by a transformer; the rule was fitted to two coils of one builder.'],
    range: 'Spark-gap coils only. No estimate is given for solid-state coils; state a spark length instead.',
    accuracy: 'Rough, by its author’s own account. Spark length says little about voltage: published air-breakdown tables do not apply to coil discharges.',
    references: [
      { text: 'J. Freau, Tesla Coil Mailing List, 1998 (quoted on the list routinely, e.g. 2002): spark length ≈ 1.7 × √(input watts) inches', mark: 'common practice' },
      { text: 'Perimeter margin: at least 10 ft beyond the longest arc, one professional performing troupe (Make: magazine)', mark: 'common practice' },
    ],
    notModelled: ['Streamer physics and breakout', 'Gap type, quenching and break rate beyond the power they pass', 'Topload shape, humidity and air pressure'],
  },
  {
    id: 'coupled-response',
    aliases: [],
    title: 'Coupled response: normal modes and energy exchange',
    gives: 'the two normal-mode frequencies, the time for energy to pass to the secondary, and the energy exchange over time',
    formulas: [
      'f<sub>lo</sub> = f<sub>0</sub> / √(1 + k),  f<sub>hi</sub> = f<sub>0</sub> / √(1 − k)',
      'q<sub>1</sub>(t) = q<sub>0</sub> cos(ω<sub>B</sub>t/2) cos(ω̄t),  ω<sub>B</sub> = ω<sub>hi</sub> − ω<sub>lo</sub>,  ω̄ = (ω<sub>hi</sub> + ω<sub>lo</sub>)/2',
      't<sub>1</sub> = 1 / (2(f<sub>hi</sub> − f<sub>lo</sub>)) ≈ 1/(2kf<sub>0</sub>)   (about 1/k half-cycles of f<sub>0</sub>)',
      'energy exchange: 𝐋 di/dt = −q/C with 𝐋 the 2 × 2 inductance matrix, integrated by fourth-order Runge–Kutta',
    ],
    assumptions: ['Two lossless circuits, each tuned to f<sub>0</sub> (the integration also handles detuned pairs); primary capacitor charged at t = 0.'],
    range: '0 ≤ k < 1.',
    accuracy:
      'Exact for the lossless pair. The primary energy reaches zero only for k = (b² − a²)/(b² + a²) with b − a odd (0.6, 5/13, 7/25 …); for other k a little energy stays behind (about 2 × 10⁻⁴ of it at k = 0.05).',
    references: [
      { text: '"Electronics" lecture notes, §2.7 "Coupled, resonant circuits", eqs. (2.99)–(2.123) (author not identified)', mark: 'confirmed' },
      { text: 'F. E. Terman, "Radio Engineers’ Handbook" (McGraw-Hill 1943), coupled circuits', mark: 'from memory' },
      { text: 'P. Drude, Annalen der Physik 13 (1904) 512–561: induction of two oscillating circuits, applied to Tesla transformers', mark: 'from memory' },
      { text: 'B. H. McGuyer, "Paul Drude’s prediction of nonreciprocal mutual inductance for Tesla transformers", PLoS ONE 9(12) e115397 (2014)', mark: 'title and topic confirmed; author and year from memory' },
      { text: 'Integration against the closed form; residual primary energy at t<sub>1</sub> for the exact-null k values', mark: 'confirmed numerically' },
      { text: 'A published handbook worked example of the transfer time', mark: 'not confirmed' },
    ],
    notModelled: ['Gap losses and quenching at the primary’s first null', 'Streamer load and the secondary’s own losses', 'Secondary voltage: the energy ratio gives only an upper limit'],
  },
  {
    id: 'uncertainty',
    aliases: [],
    title: 'Uncertainty propagation',
    gives: 'a band around the loaded frequency and the tap positions at its ends',
    formulas: [
      'for each source s: f<sub>s,low</sub>, f<sub>s,high</sub> = the loaded frequency with s at the ends of its stated range, the others nominal',
      'Δ<sub>−</sub> = √(Σ<sub>s</sub> (f<sub>s,low</sub>/f − 1)²),  Δ<sub>+</sub> = √(Σ<sub>s</sub> (f<sub>s,high</sub>/f − 1)²);  band = [f(1 − Δ<sub>−</sub>), f(1 + Δ<sub>+</sub>)]',
      'tap band: the required inductance at the band’s ends, with the primary model’s ±1.5 % added in quadrature',
    ],
    assumptions: [
      'Sources: self-capacitance ±5 % (doubled outside Medhurst’s table); secondary inductance ±0.5 %, or −0.5 %/+5 % when space-wound; topload surroundings ±5 %; streamer allowance 0.8–2 pF per foot; form diameter ±1 mm; primary model ±1.5 %.',
      'Sources are independent and the model is nearly linear over each range.',
    ],
    range: 'Every design with a secondary; the tap band needs a primary and a tank.',
    accuracy: 'A planning band from stated accuracies, not a statistical confidence interval. Tune at low power first.',
    references: [
      { text: 'The stated accuracies of each method above (Medhurst 1947; Rosa and Knight; builders’ reports)', mark: 'common practice' },
    ],
    notModelled: ['Correlations between sources', 'Errors in the builder’s other measurements (turn count, winding length)', 'Everything listed under “not modelled” in the sections above'],
  },
];

/** Limits that apply to the whole model, listed once at the foot of /methods. */
export const globalLimits: string[] = [
  'Streamer physics: length, branching, the space-charge cloud and their load on the coil',
  'Spark-gap losses and quenching; the gap is an ideal switch',
  'Surroundings and nearby objects: walls, ceiling, people, furniture, the strike rail and metal nearby',
  'The secondary’s own field and current distribution beyond one lumped capacitance (no transmission-line model)',
  'Ground resistance: the ground is a perfect plane at the stated clearance',
  'Dielectric of the coil form and of the enamel',
  'Temperature: copper at 20 °C, no heating during a run',
  'Helicity of the winding and proximity effect between turns',
  'Mains-side behaviour: transformer saturation, resonant rise, power factor, filters',
];

/** The note that explains a case's `method`: by its own id or one of its aliases. */
export function methodNoteFor(method: string): MethodNote | undefined {
  return methodNotes.find((n) => n.id === method || n.aliases.includes(method));
}
