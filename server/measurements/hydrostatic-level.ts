/** Water depth over a submerged pressure sensor from the hydrostatic law. */

/** Standard acceleration of gravity g_n, m/s² (exact by definition, 3rd CGPM 1901; NIST SP 811). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;

/**
 * Level above the vessel floor: h = p_g / (ρ·g) + z_s, from the hydrostatic law p = ρ·g·h for a
 * liquid at rest (White, Fluid Mechanics, 7th ed., 2011, eq. 2.14; Munson et al., Fundamentals of
 * Fluid Mechanics, §2.3). p_g is the gauge pressure at the sensor, Pa (absolute reading minus the
 * air pressure); ρ the water density, kg/m³; z_s the height of the sensing port above the floor, m.
 * Valid for still water (the bed's surface moves slowly next to the pressure wave speed) and
 * constant density over the column.
 */
export function hydrostaticLevelM(
  gaugePressurePa: number,
  densityKgPerM3: number,
  sensorHeightM: number,
): number {
  return gaugePressurePa / (densityKgPerM3 * STANDARD_GRAVITY_M_PER_S2) + sensorHeightM;
}
