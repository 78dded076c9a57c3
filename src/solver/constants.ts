/**
 * Physical and material constants in SI base units.
 *
 * The electromagnetic constants are the CODATA 2022 recommended values (P. J. Mohr et al., "CODATA
 * recommended values of the fundamental physical constants: 2022", NIST, 2024). The copper data are
 * those of IEC 60028 (1925), "International standard of resistance for copper" (from memory).
 */

/** Metres per inch: exact by definition, the international inch (1959), NIST SP 811 (2008) Appendix B.8. */
export const METRES_PER_INCH = 0.0254;

/** Vacuum magnetic permeability μ0 in H/m (CODATA 2022). */
export const MU_0 = 1.25663706127e-6;

/** Vacuum electric permittivity ε0 in F/m (CODATA 2022). */
export const EPSILON_0 = 8.8541878188e-12;

/** Speed of light in vacuum in m/s (exact by definition of the metre; CODATA 2022). */
export const C_0 = 299792458;

/** Resistivity of annealed copper at 20 °C in Ω·m: 1/58 Ω·mm²/m, 100 % IACS (IEC 60028, from memory). */
export const COPPER_RESISTIVITY_20C = 1.7241e-8;

/** Temperature coefficient of resistance of annealed copper at 20 °C in 1/K (IEC 60028, from memory). */
export const COPPER_TEMP_COEFF_20C = 0.00393;

/** Density of annealed copper in kg/m³: 8.89 g/cm³ (IEC 60028, from memory). */
export const COPPER_DENSITY = 8890;
