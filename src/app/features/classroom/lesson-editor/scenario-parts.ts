/** The parts a question can be about: bed ids, and tank or sump ids, in file order. */
export interface ScenarioParts {
  beds: string[];
  stores: string[];
}

/**
 * The beds and the stores (tanks and sumps) of a scenario document, read leniently: a vessel
 * without a text `id` and `kind` is left out, so a half-written document still offers the rest.
 */
export function scenarioParts(document: Record<string, unknown>): ScenarioParts {
  const vessels: unknown[] = Array.isArray(document['vessels']) ? document['vessels'] : [];
  const described = vessels.flatMap((v) => (isVessel(v) ? [v] : []));
  return {
    beds: described.filter((v) => v.kind === 'bed').map((v) => v.id),
    stores: described.filter((v) => v.kind !== 'bed').map((v) => v.id),
  };
}

function isVessel(value: unknown): value is { id: string; kind: string } {
  if (typeof value !== 'object' || value === null) return false;
  const record = value as Record<string, unknown>;
  return typeof record['id'] === 'string' && typeof record['kind'] === 'string';
}
