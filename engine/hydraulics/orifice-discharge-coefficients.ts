/**
 * Discharge coefficients C_d = C_c·C_v of small openings under a head, dimensionless, by edge:
 * - sharp-edged circular orifice 0.61 (Hamilton Smith's table: 0.603–0.621 for heads of 20 → 1 ft);
 * - short cylindrical tube running full, 2–3 diameters long, 0.82 (measured; theory 0.87);
 * - bell-mouthed / well-rounded entry 0.97 (Weisbach's data, C_v 0.959–0.994 with C_c = 1);
 * - re-entrant (Borda) tube 0.52 (from memory: the classic 0.5–0.52).
 * Source: Encyclopaedia Britannica 11th ed. (1911), "Hydromechanics" (W. C. Unwin), §§17–20.
 */
export const ORIFICE_DISCHARGE_COEFFICIENTS = {
  sharpEdged: 0.61,
  shortTube: 0.82,
  rounded: 0.97,
  reentrant: 0.52,
} as const;
