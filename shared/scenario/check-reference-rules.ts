import type { RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

/**
 * Ids are unique across vessels and pumps; every `to`, `in`, `from`, `pump`, `vessel` and `bed`
 * names something that exists; beds drain into a tank or sump, never into a bed.
 */
export function checkReferenceRules(fields: ScenarioFields): RuleIssue[] {
  const issues: RuleIssue[] = [];
  const vesselKinds = new Map(fields.vessels.map((vessel) => [vessel.id, vessel.kind]));
  const pumpIds = new Set(fields.pumps.map((pump) => pump.id));
  const seen = new Set<string>();
  const checkUnique = (id: string, path: (string | number)[]) => {
    if (seen.has(id)) issues.push({ path, message: `The id "${id}" is used twice; ids must be unique.` });
    seen.add(id);
  };
  fields.vessels.forEach((vessel, index) => checkUnique(vessel.id, ['vessels', index, 'id']));
  fields.pumps.forEach((pump, index) => checkUnique(pump.id, ['pumps', index, 'id']));
  const needVessel = (id: string, path: (string | number)[], allowOut: boolean) => {
    if (vesselKinds.has(id) || (allowOut && id === 'out')) return;
    const hint = allowOut ? ' (or "out" for water leaving the system)' : '';
    issues.push({ path, message: `No vessel has the id "${id}"; use an existing vessel id${hint}.` });
  };
  fields.vessels.forEach((vessel, index) => {
    if (vessel.overflow !== undefined) {
      needVessel(vessel.overflow.to, ['vessels', index, 'overflow', 'to'], true);
      if (vessel.overflow.to === vessel.id) {
        issues.push({ path: ['vessels', index, 'overflow', 'to'], message: 'An overflow cannot lead back into its own vessel.' });
      }
    }
    if (vessel.kind !== 'bed') return;
    const path = ['vessels', index, 'drain', 'to'];
    const target = vesselKinds.get(vessel.drain.to);
    if (target === undefined) needVessel(vessel.drain.to, path, false);
    else if (target === 'bed') issues.push({ path, message: 'A bed drains to a tank or sump, not to a bed.' });
  });
  fields.pumps.forEach((pump, index) => {
    needVessel(pump.in, ['pumps', index, 'in'], false);
    pump.outlets.forEach((outlet, outletIndex) => needVessel(outlet.to, ['pumps', index, 'outlets', outletIndex, 'to'], false));
  });
  fields.leaks.forEach((leak, index) => needVessel(leak.from, ['leaks', index, 'from'], false));
  const needPump = (id: string, path: (string | number)[]) => {
    if (!pumpIds.has(id)) issues.push({ path, message: `No pump has the id "${id}"; use an existing pump id.` });
  };
  fields.schedule.forEach((entry, index) => {
    if ('pump' in entry) needPump(entry.pump, ['schedule', index, 'pump']);
  });
  fields.controls.forEach((control, index) => {
    needPump(control.pump, ['controls', index, 'pump']);
    needVessel(control.vessel, ['controls', index, 'vessel'], false);
  });
  fields.faults.forEach((fault, index) => {
    if (fault.kind === 'pump-worn') needPump(fault.pump, ['faults', index, 'pump']);
    else if (vesselKinds.get(fault.bed) !== 'bed') {
      issues.push({ path: ['faults', index, 'bed'], message: `No bed has the id "${fault.bed}"; use an existing bed id.` });
    }
  });
  return issues;
}
