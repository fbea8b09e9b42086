import { type Dimension, type UnitSystem, formatQuantity } from '../../../../shared/scenario';
import { formatElapsed } from '../../ui/time-series-chart/time-axis';
import type { CrossSectionEvent } from './cross-section-data';
import { formatClock } from './format-clock';

type Words = (
  where: string,
  at: string,
  read: (key: string, dimension: Dimension) => string,
) => string;

/** Our sentence for each event kind; `read` formats one of the event's numbers ('' when absent). */
const CAPTIONS: Readonly<Record<string, Words>> = {
  'spill-start': (w, at) => `${w} starts spilling over its standpipe at ${at}`,
  'spill-end': (w, at) => `${w} stops spilling at ${at} without priming`,
  primed: (w, at, read) =>
    `${w} primed at ${at} — spill flow reached ${read('spillM3PerS', 'flow')}` +
    ` (spill number ${read('spillNumber', 'dimensionless')})`,
  'siphon-break': (w, at, read) =>
    `${w}: the siphon broke at ${at} — air got in at ${read('levelM', 'length')}` +
    ` after ${read('drainDurationS', 'time')} of draining`,
  'spill-stall': (w, at, read) =>
    `${w} stalls spilling at ${at}: the inflow ${read('inflowM3PerS', 'flow')}` +
    ` stays under the priming flow ${read('primingFlowM3PerS', 'flow')}`,
  'siphon-lock': (w, at, read) =>
    `${w}: the siphon locks on at ${at}: the inflow ${read('inflowM3PerS', 'flow')}` +
    ` keeps up with the drain at the slots (${read('siphonFlowAtBreakM3PerS', 'flow')})`,
  'rim-overflow': (w, at) => `${w} is full to the rim at ${at} and spills over`,
  'overflow-start': (w, at) => `${w} starts running over its overflow at ${at}`,
  'overflow-end': (w, at) => `${w} stops overflowing at ${at}`,
  'below-min-level': (w, at, read) =>
    `${w} drops below its fish-safe level (${read('minLevelM', 'length')}) at ${at}`,
  'pump-dry': (w, at) => `${w} runs dry at ${at}: its intake is out of the water`,
  'pump-restart': (w, at) => `${w} runs again at ${at}`,
  'pump-off': (w, at) => `${w} stops at ${at}`,
  'pump-on': (w, at) => `${w} starts at ${at}`,
  'leak-start': (w, at, read) => `a ${read('diameterM', 'diameter')} leak opens in ${w} at ${at}`,
  'back-siphon-start': (w, at) => `water siphons back through ${w} at ${at}`,
  'back-siphon-end': (w, at) => `the back-siphon through ${w} stops at ${at}`,
  'float-switch': (w, at) => `the float switch of ${w} acts at ${at}`,
};

/**
 * The short caption of an event, in the reader's units, e.g.
 * "bed-north primed at 6:42 — spill flow reached 2.95 L/min (spill number 0.7)".
 */
export function eventCaption(event: CrossSectionEvent, system: UnitSystem): string {
  const read = (key: string, dimension: Dimension): string => {
    const value = event.values?.[key];
    if (value === undefined || value === null) return '–';
    return dimension === 'time' ? formatElapsed(value) : formatQuantity(value, dimension, system);
  };
  const at = formatClock(event.t_s);
  const words = CAPTIONS[event.kind];
  return words ? words(event.where, at, read) : `${event.where}: ${event.kind} at ${at}`;
}
