/**
 * The sizing report of a system: what-if runs on the run pool (the design, a cold start, a power
 * cut mid-flood and the restart, leaks) and mass balances, each check a verdict with its numbers.
 */
import type { SizingReport } from '../../shared/contracts/sizing';
import { parseQuantity, type Dimension } from '../../shared/scenario/index';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest } from '../http/http-error';
import type { RunPool } from '../runs/run-pool';
import { systemScenario } from '../sweeps/sweeps-service';
import { checkWords } from './check-words';
import { coldStartChecks } from './cold-start-checks';
import { LEAK_START_S, leakCases, leakCheck } from './leak-checks';
import { bedLoads, loadChecks } from './load-checks';
import { powerCutChecks, powerCutMoment } from './power-cut-checks';
import { bedTankRatioCheck, cyclesPerHourChecks, turnoverChecks } from './practice-checks';
import { runWhatIf } from './run-what-if';
import { coldStart, plainDesign, powerCut } from './what-if-scenarios';

/** Simulated time of the design run and of the cold start, s. */
const WHAT_IF_DURATION_S = 2 * 3600;

/** A query value in SI within [min, max], or the default; a 400 naming the field otherwise. */
function readSetting(
  value: string | undefined,
  dimension: Dimension,
  field: string,
  range: { min: number; max: number; fallback: number; words: string },
): number {
  if (value === undefined) return range.fallback;
  const parsed = parseQuantity(value, dimension, field);
  if (!parsed.success) throw badRequest(parsed.issue.message, [parsed.issue]);
  if (!(parsed.value >= range.min && parsed.value <= range.max)) {
    throw badRequest(`Choose ${range.words}.`, [
      { path: field, message: `Choose ${range.words}.` },
    ]);
  }
  return parsed.value;
}

/** `GET /api/systems/:id/sizing`; the checks' sentences give numbers in `user.units`. */
export async function sizingReport(
  deps: { db: Database; pool: RunPool },
  user: Pick<SessionUser, 'id' | 'units'>,
  systemId: string,
  query: { cutDuration?: string | undefined; leakDiameter?: string | undefined },
): Promise<SizingReport> {
  const { system } = await requireSystemAccess(deps.db, user, systemId, 'read');
  const scenario = systemScenario(system.scenario);
  const cutS = readSetting(query.cutDuration, 'time', 'cutDuration', {
    min: 60,
    max: 24 * 3600,
    fallback: 3600,
    words: 'a power cut from 1 min to 24 h',
  });
  const leakM = readSetting(query.leakDiameter, 'diameter', 'leakDiameter', {
    min: 0.001,
    max: 0.2,
    fallback: 0.01,
    words: 'a leak from 1 mm to 200 mm across',
  });
  const [design, cold] = await Promise.all([
    runWhatIf(deps.pool, 'design', plainDesign(scenario, WHAT_IF_DURATION_S)),
    runWhatIf(deps.pool, 'cold-start', coldStart(scenario, WHAT_IF_DURATION_S)),
  ]);
  const cut = powerCutMoment(cold);
  const leaks = leakCases(scenario, leakM);
  const [cutRun, ...leakRuns] = await Promise.all([
    runWhatIf(deps.pool, 'power-cut', powerCut(scenario, cut.atS, cutS)),
    ...leaks.map((leak) => runWhatIf(deps.pool, 'leak', leak.scenario)),
  ]);
  const loads = bedLoads(scenario);
  const words = checkWords(user.units);
  const checks = [
    ...coldStartChecks(scenario, cold, words),
    ...powerCutChecks(scenario, cutRun, cut, cutS, words),
    ...leaks.flatMap((leak, k) => (leakRuns[k] ? [leakCheck(leak, leakRuns[k], words)] : [])),
    ...bedTankRatioCheck(scenario, words),
    ...turnoverChecks(scenario),
    ...cyclesPerHourChecks(scenario, design),
    ...loadChecks(loads, words),
  ];
  return {
    systemId,
    checks,
    loads,
    assumptions: {
      coldStartDurationS: WHAT_IF_DURATION_S,
      powerCutAtS: cut.atS,
      powerCutDurationS: cutS,
      leakDiameterM: leakM,
      leakStartS: LEAK_START_S,
    },
  };
}
