/**
 * Density of air-free water at 1 atm, kg/m³, from its temperature in °C, for turning a pressure
 * reading into a depth:
 * ρ = (999.83952 + 16.945176 t − 7.9870401e-3 t² − 46.170461e-6 t³ + 105.56302e-9 t⁴
 *      − 280.54253e-12 t⁵) / (1 + 16.879850e-3 t)
 * Valid 0–150 °C. Source: G. S. Kell, "Density, thermal expansivity, and compressibility of liquid
 * water from 0° to 150 °C", J. Chem. Eng. Data 20(1):97–105, 1975 (the fit the engine uses too).
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
