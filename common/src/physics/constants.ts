/**
 * Physical constants and unit conversions.
 *
 * Values: CODATA 2018 recommended values (NIST, https://physics.nist.gov/cuu/Constants/),
 * as required by SPEC §2. c and e are exact by the 2019 SI definition.
 */

/** Speed of light in vacuum [m/s] (exact). */
export const SPEED_OF_LIGHT_MPS = 299_792_458;
/** Elementary charge [C] (exact). */
export const ELEMENTARY_CHARGE_C = 1.602_176_634e-19;
/** Electron rest mass [kg] (CODATA 2018). */
export const ELECTRON_MASS_KG = 9.109_383_7015e-31;
/** Vacuum electric permittivity [F/m] (CODATA 2018). */
export const VACUUM_PERMITTIVITY_FPM = 8.854_187_8128e-12;

/** Metres per kilometre. */
export const M_PER_KM = 1000;
/** Hertz per megahertz. */
export const HZ_PER_MHZ = 1e6;
/** Nanoseconds per second. */
export const NS_PER_S = 1e9;
/** Milliseconds per second. */
export const MS_PER_S = 1000;
/** Speed of light [km/ms] (= c / 1e6). */
export const SPEED_OF_LIGHT_KM_PER_MS = SPEED_OF_LIGHT_MPS / M_PER_KM / MS_PER_S;

/** Mean Earth radius for HF geometry [km] (ITU-R P.533). */
export const EARTH_RADIUS_KM = 6371;
/** One TEC unit [electrons/m²]. */
export const ELECTRONS_PER_M2_PER_TECU = 1e16;

/**
 * Coefficient of the first-order ionospheric group delay [m³/s²]:
 * Δ = 40.3·TEC/f² metres (ITU-R P.531; GPS interface specification IS-GPS-200).
 * 40.3 is the rounded value of e²/(8π²ε₀mₑ) = 40.308…; the standards quote 40.3.
 */
export const FIRST_ORDER_DELAY_COEFFICIENT = 40.3;

/** Degrees ↔ radians. */
export const RAD_PER_DEG = Math.PI / 180;
export const DEG_PER_RAD = 180 / Math.PI;
