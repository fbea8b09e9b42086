/** Every bed filling at once from empty: does a pump run dry, does a fish tank fall below its minimum. */
import { pumpReserves } from '../../engine/index';
import type { SizingCheck } from '../../shared/contracts/sizing';
import type { Scenario } from '../../shared/scenario/index';
import type { RunResultParts } from '../runs/run-worker-messages';
import { sizingCheck, type CheckWords } from './check-words';

const MASS_BALANCE = 'physics (mass balance)';

/** Mass balance with no return flow: the water every fed bed takes at once against the source's reserve. */
function reserveChecks(scenario: Scenario, words: CheckWords): SizingCheck[] {
  return pumpReserves(scenario).map((r) => {
    const short = r.floodVolumeM3 > r.aboveIntakeM3;
    const belowMin = r.aboveMinimumM3 !== null && r.floodVolumeM3 > r.aboveMinimumM3;
    const beds = r.bedIds.length > 0 ? r.bedIds.join(', ') : 'no bed';
    const detail =
      `Filling ${beds} to the standpipe tops at once, with nothing draining back, takes ${words.volume(r.floodVolumeM3)} from ${r.sourceId}, ` +
      `which holds ${words.volume(r.aboveIntakeM3)} above pump ${r.pumpId}'s intake` +
      (r.aboveMinimumM3 === null
        ? '.'
        : ` and ${words.volume(r.aboveMinimumM3)} above its fish-safe minimum.`) +
      (short
        ? ' The pump would run dry: make the source bigger or start with more water.'
        : belowMin
          ? ' The fish tank would fall below its minimum.'
          : '');
    return sizingCheck({
      check: 'cold-start-reserve',
      subject: r.pumpId,
      title: `Water for filling every bed at once (pump ${r.pumpId})`,
      status: short ? 'fails' : belowMin ? 'warning' : 'ok',
      value: r.floodVolumeM3,
      limit: r.aboveIntakeM3,
      unit: 'm3',
      source: MASS_BALANCE,
      detail,
    });
  });
}

/**
 * Checks of the cold-start run (`run`: every bed empty at the start, all pumps on): time each pump
 * ran dry, the lowest level of each vessel with a fish-safe minimum, and the mass-balance reserve;
 * numbers in the sentences in `words`' units.
 */
export function coldStartChecks(
  scenario: Scenario,
  run: RunResultParts,
  words: CheckWords,
): SizingCheck[] {
  const pumps = run.summary.pumps.map((p) => {
    const dry = p.dry_s ?? 0;
    return sizingCheck({
      check: 'cold-start-pump-dry',
      subject: p.id,
      title: `Pump ${p.id} on a cold start`,
      status: dry > 0 ? 'fails' : 'ok',
      value: dry,
      limit: 0,
      unit: 's',
      source: MASS_BALANCE,
      detail:
        dry > 0
          ? `With every bed filling from empty, pump ${p.id} ran dry for ${words.time(dry)}.`
          : `With every bed filling from empty, pump ${p.id} never ran dry.`,
    });
  });
  const levels = scenario.vessels.flatMap((vessel) => {
    const summary = run.summary.vessels.find((v) => v.id === vessel.id);
    if (vessel.minLevel === undefined || !summary || summary.minLevel_m === null) return [];
    const low = summary.minLevel_m;
    const below = low < vessel.minLevel;
    return [
      sizingCheck({
        check: 'cold-start-min-level',
        subject: vessel.id,
        title: `Lowest level of ${vessel.id} on a cold start`,
        status: below ? 'fails' : 'ok',
        value: low,
        limit: vessel.minLevel,
        unit: 'm',
        source: 'the fish-safe minimum level of the system',
        detail: `While every bed filled from empty, ${vessel.id} fell to ${words.length(low)} (fish-safe minimum ${words.length(vessel.minLevel)})${below ? '.' : ', and stayed above it.'}`,
      }),
    ];
  });
  return [...reserveChecks(scenario, words), ...pumps, ...levels];
}
