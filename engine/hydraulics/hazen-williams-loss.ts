/**
 * Friction head loss by Hazen–Williams (SI form), m of water:
 * h_f = 10.67·L·Q^1.852 / (C^1.852·D^4.8704), sign of Q (an odd function, for backflow).
 * `lengthM` m, `flowM3PerS` m³/s, `c` Hazen–Williams C (dimensionless by convention; 150 for plastic),
 * `diameterM` bore, m. Valid for water near 15–25 °C in turbulent flow (about D ≥ 50 mm and
 * v ≥ 0.3 m/s in practice); small pipes at low velocity lose more than it predicts, which is why
 * Darcy–Weisbach is the default. Source: the constants of EPANET 2 (L. A. Rossman, EPA/600/R-00/057,
 * 2000, Table 3.1); matches Ill. Admin. Code tit. 77 pt. 906 App. A Exh. I (plastic pipe, C = 150).
 */
export function hazenWilliamsHeadLossM(
  lengthM: number,
  flowM3PerS: number,
  c: number,
  diameterM: number,
): number {
  const magnitude =
    (10.67 * lengthM * Math.abs(flowM3PerS) ** 1.852) / (c ** 1.852 * diameterM ** 4.8704);
  return flowM3PerS < 0 ? -magnitude : magnitude;
}
