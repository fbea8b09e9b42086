import type { Dimension } from './dimension';

/** A system of units for display: metric, or US customary. */
export type UnitSystem = 'metric' | 'us';

/** A display unit: the mathjs name used for conversion and the label shown to people. */
export interface DisplayUnit {
  unit: string;
  label: string;
}

/**
 * The unit each dimension is shown in, per system. Temperature is shown in °C or °F; flows in
 * L/min or US gal/min; diameters in mm or in; elevations and levels in m or in.
 */
export const DISPLAY_UNITS: Readonly<Record<UnitSystem, Readonly<Record<Dimension, DisplayUnit>>>> =
  {
    metric: {
      length: { unit: 'm', label: 'm' },
      diameter: { unit: 'mm', label: 'mm' },
      area: { unit: 'm^2', label: 'm²' },
      volume: { unit: 'L', label: 'L' },
      time: { unit: 's', label: 's' },
      flow: { unit: 'L/min', label: 'L/min' },
      power: { unit: 'W', label: 'W' },
      temperature: { unit: 'degC', label: '°C' },
      dimensionless: { unit: '', label: '' },
    },
    us: {
      length: { unit: 'in', label: 'in' },
      diameter: { unit: 'in', label: 'in' },
      area: { unit: 'ft^2', label: 'ft²' },
      volume: { unit: 'gal', label: 'gal' },
      time: { unit: 's', label: 's' },
      flow: { unit: 'gal/min', label: 'gal/min' },
      power: { unit: 'W', label: 'W' },
      temperature: { unit: 'degF', label: '°F' },
      dimensionless: { unit: '', label: '' },
    },
  };
