/** The cautions Tidewright shows, in its own words, as common practice (no source). */

/** Which caution: each names one hazard of a fish-and-plant system. */
export type CautionTopic = 'electrical' | 'open-water' | 'heavy-beds' | 'aeration' | 'temperature';

/** One caution as shown: an icon, a short title and the advice. */
export interface Caution {
  readonly topic: CautionTopic;
  readonly icon: string;
  readonly title: string;
  readonly advice: string;
}

/** Every caution, in the order they are shown. Common practice, no source. */
export const CAUTIONS: readonly Caution[] = [
  {
    topic: 'electrical',
    icon: 'electrical_services',
    title: 'Electricity near water',
    advice:
      'Put pumps, heaters and every other corded device in or near the water on a circuit with ' +
      'ground-fault protection (a GFCI or RCD), test it regularly, and use wiring, sockets and ' +
      'connectors rated for outdoor, wet locations. Give each cord a drip loop below its socket.',
  },
  {
    topic: 'open-water',
    icon: 'child_care',
    title: 'Open water and small children',
    advice:
      'A small child can drown in a few centimetres of water. Cover tanks and sumps with a lid ' +
      'that holds weight, or fence them off, and never leave open water unattended.',
  },
  {
    topic: 'heavy-beds',
    icon: 'scale',
    title: 'Beds full of wet media are heavy',
    advice:
      'Water plus wet gravel or clay weighs far more than it looks. Use the load Tidewright ' +
      'reports for each bed, and have stands, supports, decks and floors checked by a qualified ' +
      'person before the first fill.',
  },
  {
    topic: 'aeration',
    icon: 'air',
    title: 'A stopped pump starves fish of oxygen',
    advice:
      'When the pump stops, so does most of the oxygen the moving water brought. Keep backup ' +
      'aeration (an air pump on a separate circuit or a battery) and a way to notice a power cut.',
  },
  {
    topic: 'temperature',
    icon: 'thermostat',
    title: 'Change water temperature slowly',
    advice:
      'Sudden temperature changes stress fish. Bring top-up or replacement water close to the tank ' +
      'temperature first, and change it a little at a time.',
  },
];
