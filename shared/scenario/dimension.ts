/**
 * The physical dimensions a scenario value can have. `diameter` is a length that the UI shows in
 * millimetres or inches; `temperature` is kept in degrees Celsius (not kelvin) everywhere.
 */
export type Dimension =
  | 'length'
  | 'diameter'
  | 'area'
  | 'volume'
  | 'time'
  | 'flow'
  | 'power'
  | 'temperature'
  | 'dimensionless';

/**
 * For each dimension: the unit a plain number is read in (SI, except degC for temperature), a
 * word for messages, and an example string for messages.
 */
export const DIMENSION_INFO: Readonly<
  Record<Dimension, { siUnit: string; noun: string; example: string }>
> = {
  length: { siUnit: 'm', noun: 'a length', example: '"0.3 m" or "12 in"' },
  diameter: { siUnit: 'm', noun: 'a diameter', example: '"25 mm" or "1 in"' },
  area: { siUnit: 'm^2', noun: 'an area', example: '"0.5 m^2" or "4 ft^2"' },
  volume: { siUnit: 'm^3', noun: 'a volume', example: '"500 L" or "100 gal"' },
  time: { siUnit: 's', noun: 'a time', example: '"90 s" or "2 h"' },
  flow: { siUnit: 'm^3/s', noun: 'a flow rate', example: '"300 L/h" or "5 gal/min"' },
  power: { siUnit: 'W', noun: 'a power', example: '"35 W"' },
  temperature: { siUnit: 'degC', noun: 'a temperature', example: '"24 degC" or "75 degF"' },
  dimensionless: { siUnit: '', noun: 'a plain number', example: '0.6' },
};
