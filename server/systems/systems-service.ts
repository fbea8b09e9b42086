/**
 * Systems: create (from a scenario, a template or an imported file), read, save with an
 * optimistic version, duplicate, export and delete. No HTTP objects here; errors are HttpErrors.
 */
import type {
  CreateSystemRequest,
  System,
  SystemAccess as SystemAccessLevel,
  SystemList,
  UpdateSystemRequest,
  VerdictStatus,
} from '../../shared/contracts/systems';
import { parseScenario } from '../../shared/scenario/index';
import type { SessionUser } from '../auth/session-user';
import { requireSystemAccess } from '../auth/system-access';
import type { Database } from '../db/database';
import { badRequest, conflict } from '../http/http-error';
import { describeSystem } from './describe-system';
import { templateScenario } from './system-templates';
import {
  deleteSystemRow,
  findUserName,
  insertSystem,
  listSystemsForUser,
  updateSystemIfVersion,
  type SystemRow,
} from './systems-repository';

type User = Pick<SessionUser, 'id'>;

const asVerdict = (value: string | null): VerdictStatus | null =>
  value === 'ok' || value === 'warning' || value === 'fails' ? value : null;

const asDocument = (value: unknown): Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : {};

/** The API form of a system row. */
export function toSystem(row: SystemRow, access: SystemAccessLevel, ownerName: string): System {
  return {
    id: row.id,
    name: row.name,
    version: row.version,
    scenario: asDocument(row.scenario),
    ownerId: row.ownerId,
    ownerName,
    access,
    lastVerdict: asVerdict(row.lastVerdict),
    calibration: row.calibration === null ? null : asDocument(row.calibration),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/**
 * Checks a scenario document with the shared schema; a failure is a 400 listing every issue with
 * its field path, under `prefix` (e.g. "scenario") when the document is nested in the body.
 * With `name`, the document's `name` is set to it first; the checked document is returned.
 */
export function checkScenarioDocument(
  document: unknown,
  name: string | undefined,
  prefix: string,
): Record<string, unknown> {
  if (typeof document !== 'object' || document === null || Array.isArray(document)) {
    throw badRequest('The scenario must be a JSON object in the scenario/1 format.', [
      { path: prefix || '(body)', message: 'Expected a JSON object.' },
    ]);
  }
  const named = name === undefined ? asDocument(document) : { ...asDocument(document), name };
  const parsed = parseScenario(named);
  if (parsed.success) return named;
  const fields = parsed.issues.map((issue) => ({
    path: prefix ? (issue.path ? `${prefix}.${issue.path}` : prefix) : issue.path || '(body)',
    message: issue.message,
  }));
  const list = fields
    .slice(0, 5)
    .map((f) => f.path)
    .join(', ');
  throw badRequest(
    `The scenario has ${fields.length} problem(s): ${list}${fields.length > 5 ? ', …' : ''}.`,
    fields,
  );
}

/** `GET /api/systems`: the user's own systems, then those shared with them. */
export async function listSystems(db: Database, user: User): Promise<SystemList> {
  const rows = await listSystemsForUser(db, user.id);
  const items = rows.map(({ system, ownerName, shareAccess }) => ({
    id: system.id,
    name: system.name,
    ...describeSystem(system.scenario),
    lastVerdict: asVerdict(system.lastVerdict),
    ownerName,
    access:
      system.ownerId === user.id
        ? ('owner' as const)
        : shareAccess === 'editor'
          ? ('editor' as const)
          : ('viewer' as const),
    updatedAt: system.updatedAt.toISOString(),
  }));
  const rank = (access: SystemAccessLevel): number => (access === 'owner' ? 0 : 1);
  items.sort((a, b) => rank(a.access) - rank(b.access));
  return { items };
}

/** `GET /api/systems/:id`. */
export async function getSystem(db: Database, user: User, systemId: string): Promise<System> {
  const { system, access } = await requireSystemAccess(db, user, systemId, 'read');
  return toSystem(system, access, await findUserName(db, system.ownerId));
}

/** Creates a system owned by `user` from a checked scenario document. */
export async function createSystemFromDocument(
  db: Database,
  user: User,
  name: string,
  document: unknown,
  prefix: string,
  calibration?: unknown,
): Promise<System> {
  const scenario = checkScenarioDocument(document, name, prefix);
  const row = await insertSystem(db, { ownerId: user.id, name, scenario, calibration });
  return toSystem(row, 'owner', await findUserName(db, user.id));
}

/** `POST /api/systems`: from a scenario document or a template. */
export async function createSystem(
  db: Database,
  user: User,
  request: CreateSystemRequest,
): Promise<System> {
  if ('template' in request) {
    return createSystemFromDocument(
      db,
      user,
      request.name,
      templateScenario(request.template),
      'template',
    );
  }
  return createSystemFromDocument(db, user, request.name, request.scenario, 'scenario');
}

/**
 * `POST /api/systems/import`: the body is a scenario file, checked as it is (errors name paths in
 * the file); the system takes the file's name unless `name` is given.
 */
export async function importSystem(
  db: Database,
  user: User,
  file: unknown,
  name?: string,
): Promise<System> {
  const checked = checkScenarioDocument(file, undefined, '');
  const fileName = checked['name'];
  const chosen = name ?? (typeof fileName === 'string' ? fileName.trim().slice(0, 200) : '');
  return createSystemFromDocument(db, user, chosen || 'Imported system', checked, '');
}

/** `PUT /api/systems/:id`: saves if `request.version` is current, else 409 `STALE_VERSION`. */
export async function updateSystem(
  db: Database,
  user: User,
  systemId: string,
  request: UpdateSystemRequest,
): Promise<System> {
  const { system, access } = await requireSystemAccess(db, user, systemId, 'write');
  const name = request.name ?? system.name;
  const scenario = checkScenarioDocument(request.scenario ?? system.scenario, name, 'scenario');
  const saved = await updateSystemIfVersion(db, system.id, request.version, { name, scenario });
  if (!saved) {
    const current = await requireSystemAccess(db, user, systemId, 'read');
    throw conflict(
      `This system was saved elsewhere since you opened it (you have version ${request.version}, the server has ${current.system.version}); reload it and apply your changes again.`,
      'STALE_VERSION',
    );
  }
  return toSystem(saved, access, await findUserName(db, saved.ownerId));
}

/** `POST /api/systems/:id/duplicate`: a copy owned by `user` (scenario and calibration, no runs or shares). */
export async function duplicateSystem(
  db: Database,
  user: User,
  systemId: string,
  name?: string,
): Promise<System> {
  const { system } = await requireSystemAccess(db, user, systemId, 'read');
  const copyName = name ?? `${system.name} (copy)`.slice(0, 200);
  return createSystemFromDocument(
    db,
    user,
    copyName,
    system.scenario,
    'scenario',
    system.calibration,
  );
}

/** `GET /api/systems/:id/scenario.json`: the scenario document and a file name for it. */
export async function exportSystemScenario(
  db: Database,
  user: User,
  systemId: string,
): Promise<{ fileName: string; document: Record<string, unknown> }> {
  const { system } = await requireSystemAccess(db, user, systemId, 'read');
  const slug =
    system.name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '') || 'system';
  return { fileName: `${slug}.scenario.json`, document: asDocument(system.scenario) };
}

/**
 * `DELETE /api/systems/:id` (owner only); its runs and shares are deleted with it.
 * `beforeDelete` runs once access is checked (the router cancels the system's active runs there).
 */
export async function deleteSystem(
  db: Database,
  user: User,
  systemId: string,
  beforeDelete: () => Promise<void> = async () => {},
): Promise<void> {
  const { system } = await requireSystemAccess(db, user, systemId, 'owner');
  await beforeDelete();
  await deleteSystemRow(db, system.id);
}
