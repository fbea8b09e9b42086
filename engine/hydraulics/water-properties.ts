/*
 * Liquid water at 1 atm (0.101325 MPa), 0–100 °C. Both fits agree with IAPWS-95 within 1e-5
 * (density) and 1e-4 (viscosity, through the IAPWS 2008 formulation) over 0–50 °C.
 */

/**
 * Density of air-free water at 1 atm, kg/m³, from temperature in °C.
 * ρ = (999.83952 + 16.945176 t − 7.9870401e-3 t² − 46.170461e-6 t³ + 105.56302e-9 t⁴
 *      − 280.54253e-12 t⁵) / (1 + 16.879850e-3 t)
 * Valid 0–150 °C. Source: G. S. Kell, "Density, thermal expansivity, and compressibility of liquid
 * water from 0° to 150 °C", J. Chem. Eng. Data 20(1):97–105, 1975.
 */
export function waterDensityKgPerM3(temperatureC: number): number {
  const t = temperatureC;
  const numerator =
    999.83952 +
    t *
      (16.945176 +
        t * (-7.9870401e-3 + t * (-46.170461e-6 + t * (105.56302e-9 + t * -280.54253e-12))));
  return numerator / (1 + 16.87985e-3 * t);
}

/** Critical temperature and density of water used to reduce the IAPWS 2008 viscosity terms. */
const CRITICAL_TEMPERATURE_K = 647.096;
const CRITICAL_DENSITY_KG_PER_M3 = 322;
const MU0_H = [1.67752, 2.20462, 0.6366564, -0.241605] as const;
/** Coefficients H_ij of μ̄1 as [i, j, H_ij]. */
const MU1_H: readonly (readonly [number, number, number])[] = [
  [0, 0, 0.520094],
  [1, 0, 0.0850895],
  [2, 0, -1.08374],
  [3, 0, -0.289555],
  [0, 1, 0.222531],
  [1, 1, 0.999115],
  [2, 1, 1.88797],
  [3, 1, 1.26613],
  [5, 1, 0.120573],
  [0, 2, -0.281378],
  [1, 2, -0.906851],
  [2, 2, -0.772479],
  [3, 2, -0.489837],
  [4, 2, -0.25704],
  [0, 3, 0.161913],
  [1, 3, 0.257399],
  [0, 4, -0.0325372],
  [3, 4, 0.0698452],
  [4, 5, 0.00872102],
  [3, 6, -0.00435673],
  [5, 6, -0.000593264],
];

/**
 * Dynamic viscosity of water at 1 atm, Pa·s, from temperature in °C.
 * μ = 1e-6 Pa·s · μ̄0(T̄)·μ̄1(T̄, ρ̄), μ̄0 = 100√T̄ / Σ H_i/T̄^i,
 * μ̄1 = exp(ρ̄ Σ H_ij (1/T̄ − 1)^i (ρ̄ − 1)^j), T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³ (ρ from Kell 1975);
 * the critical enhancement μ̄2 is 1 for liquid water far from the critical point.
 * Valid 0–100 °C at 1 atm. Source: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the
 * Viscosity of Ordinary Water Substance" (Huber et al., J. Phys. Chem. Ref. Data 38:101, 2009).
 */
export function waterDynamicViscosityPaS(temperatureC: number): number {
  const tBar = (temperatureC + 273.15) / CRITICAL_TEMPERATURE_K;
  const rhoBar = waterDensityKgPerM3(temperatureC) / CRITICAL_DENSITY_KG_PER_M3;
  let denominator = 0;
  MU0_H.forEach((h, i) => (denominator += h / tBar ** i));
  const mu0 = (100 * Math.sqrt(tBar)) / denominator;
  let sum = 0;
  for (const [i, j, h] of MU1_H) sum += h * (1 / tBar - 1) ** i * (rhoBar - 1) ** j;
  return 1e-6 * mu0 * Math.exp(rhoBar * sum);
}

/**
 * Kinematic viscosity of water at 1 atm, m²/s: ν = μ/ρ from the two functions above.
 * Valid 0–100 °C. 20 °C gives 1.0034e-6 m²/s (IAPWS-95 / IAPWS 2008).
 */
export function waterKinematicViscosityM2PerS(temperatureC: number): number {
  return waterDynamicViscosityPaS(temperatureC) / waterDensityKgPerM3(temperatureC);
}
