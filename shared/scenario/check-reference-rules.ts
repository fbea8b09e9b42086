import type { RuleIssue } from './rule-issue';
import type { ScenarioFields } from './scenario-input-schema';

type Path = (string | number)[];

/** What the reference checks need to know: vessel kinds by id and pump ids. */
interface Known {
  vesselKinds: Map<string, string>;
  pumpIds: Set<string>;
  issues: RuleIssue[];
}

/**
 * Ids are unique across vessels and pumps; every `to`, `in`, `from`, `pump`, `vessel` and `bed`
 * names something that exists; beds drain into a tank or sump, never into a bed.
 */
export function checkReferenceRules(fields: ScenarioFields): RuleIssue[] {
  const known: Known = {
    vesselKinds: new Map(fields.vessels.map((vessel) => [vessel.id, vessel.kind])),
    pumpIds: new Set(fields.pumps.map((pump) => pump.id)),
    issues: [],
  };
  checkUniqueIds(fields, known.issues);
  checkVesselReferences(fields, known);
  checkPumpReferences(fields, known);
  return known.issues;
}

function checkUniqueIds(fields: ScenarioFields, issues: RuleIssue[]): void {
  const seen = new Set<string>();
  const checkUnique = (id: string, path: Path) => {
    if (seen.has(id))
      issues.push({ path, message: `The id "${id}" is used twice; ids must be unique.` });
    seen.add(id);
  };
  fields.vessels.forEach((vessel, index) => checkUnique(vessel.id, ['vessels', index, 'id']));
  fields.pumps.forEach((pump, index) => checkUnique(pump.id, ['pumps', index, 'id']));
}

function needVessel(known: Known, id: string, path: Path, allowOut = false): void {
  if (known.vesselKinds.has(id) || (allowOut && id === 'out')) return;
  const hint = allowOut ? ' (or "out" for water leaving the system)' : '';
  known.issues.push({
    path,
    message: `No vessel has the id "${id}"; use an existing vessel id${hint}.`,
  });
}

function needPump(known: Known, id: string, path: Path): void {
  if (!known.pumpIds.has(id))
    known.issues.push({ path, message: `No pump has the id "${id}"; use an existing pump id.` });
}

function checkVesselReferences(fields: ScenarioFields, known: Known): void {
  fields.vessels.forEach((vessel, index) => {
    if (vessel.overflow !== undefined) {
      const path = ['vessels', index, 'overflow', 'to'];
      if (vessel.overflow.to === vessel.id)
        known.issues.push({ path, message: 'An overflow cannot lead back into its own vessel.' });
      else needVessel(known, vessel.overflow.to, path, true);
    }
    if (vessel.kind !== 'bed') return;
    const path = ['vessels', index, 'drain', 'to'];
    const target = known.vesselKinds.get(vessel.drain.to);
    if (target === undefined) needVessel(known, vessel.drain.to, path);
    else if (target === 'bed')
      known.issues.push({ path, message: 'A bed drains to a tank or sump, not to a bed.' });
  });
  fields.leaks.forEach((leak, index) => needVessel(known, leak.from, ['leaks', index, 'from']));
  fields.faults.forEach((fault, index) => {
    if (fault.kind === 'drain-blocked' && known.vesselKinds.get(fault.bed) !== 'bed') {
      known.issues.push({
        path: ['faults', index, 'bed'],
        message: `No bed has the id "${fault.bed}"; use an existing bed id.`,
      });
    }
  });
}

function checkPumpReferences(fields: ScenarioFields, known: Known): void {
  fields.pumps.forEach((pump, index) => {
    needVessel(known, pump.in, ['pumps', index, 'in']);
    pump.outlets.forEach((outlet, outletIndex) =>
      needVessel(known, outlet.to, ['pumps', index, 'outlets', outletIndex, 'to']),
    );
  });
  fields.schedule.forEach((entry, index) => {
    if ('pump' in entry) needPump(known, entry.pump, ['schedule', index, 'pump']);
  });
  fields.controls.forEach((control, index) => {
    needPump(known, control.pump, ['controls', index, 'pump']);
    needVessel(known, control.vessel, ['controls', index, 'vessel']);
  });
  fields.faults.forEach((fault, index) => {
    if (fault.kind === 'pump-worn') needPump(known, fault.pump, ['faults', index, 'pump']);
  });
}
