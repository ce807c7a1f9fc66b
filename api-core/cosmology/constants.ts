/**
 * Physical and astronomical constants, SI units unless the name says otherwise.
 * One file, each value with its source (DESIGN.md §2).
 */

/** Speed of light in vacuum, m/s. Exact by definition of the metre (SI 2019; CODATA 2018). */
export const SPEED_OF_LIGHT = 299_792_458;

/** Speed of light in km/s, the unit in which H0 is quoted (km/s/Mpc). */
export const SPEED_OF_LIGHT_KM_S = 299_792.458;

/** Newtonian constant of gravitation, m^3 kg^-1 s^-2. CODATA 2018 (Tiesinga et al. 2021, RMP 93, 025010). */
export const GRAVITATIONAL_CONSTANT = 6.674_30e-11;

/** Stefan–Boltzmann constant, W m^-2 K^-4. CODATA 2018 (exact, derived from exact h, k_B, c). */
export const STEFAN_BOLTZMANN = 5.670_374_419e-8;

/** Boltzmann constant, J/K. Exact (SI 2019; CODATA 2018). */
export const BOLTZMANN = 1.380_649e-23;

/** Reduced Planck constant, J s. CODATA 2018 (exact value h/2π, truncated to 10 digits). */
export const REDUCED_PLANCK = 1.054_571_817e-34;

/** Elementary charge, C; also joules per electronvolt. Exact (SI 2019; CODATA 2018). */
export const ELECTRONVOLT = 1.602_176_634e-19;

/** Astronomical unit, m. Exact: IAU 2012 Resolution B2. */
export const ASTRONOMICAL_UNIT = 149_597_870_700;

/** Parsec, m: 648000/π au. IAU 2015 Resolution B2 (wording recalled from memory, see SOURCES.md). */
export const PARSEC = (648_000 / Math.PI) * ASTRONOMICAL_UNIT;

/** Megaparsec, m. */
export const MEGAPARSEC = 1e6 * PARSEC;

/** Julian year, s: 365.25 days of 86400 s (IAU convention, common practice for the light year). */
export const JULIAN_YEAR = 365.25 * 86_400;

/** Light year, m: c × Julian year (IAU). */
export const LIGHT_YEAR = SPEED_OF_LIGHT * JULIAN_YEAR;

/** Gigayear (1e9 Julian years), s. */
export const GIGAYEAR = 1e9 * JULIAN_YEAR;

/** CMB temperature today, K. Fixsen (2009), ApJ 707, 916. Default for `tcmb`. */
export const CMB_TEMPERATURE = 2.7255;

/** Effective number of neutrino species, standard model value (common practice, used by Planck 2018). Default for `nEff`. */
export const STANDARD_NEFF = 3.046;
