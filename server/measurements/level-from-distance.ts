/**
 * Water level under a sensor that looks down at the surface (ultrasonic, radar, time of flight).
 *
 * level = H_mount − d, with H_mount the height of the sensor's face above the vessel floor and
 * d the distance it reads from its face down to the water surface (both m). Valid while the
 * surface is below the sensor's blind zone and inside its beam; a reading larger than H_mount
 * gives a negative level, which the caller rejects. (Geometry; common practice for
 * non-contact level sensors, no source needed.)
 */
export function levelFromDistanceM(mountingHeightM: number, distanceM: number): number {
  return mountingHeightM - distanceM;
}
