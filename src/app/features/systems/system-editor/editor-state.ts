import { Injectable, computed, inject, signal } from '@angular/core';
import {
  type Scenario,
  type ScenarioIssue,
  ScenarioFieldsSchema,
  normaliseScenario,
  parseScenario,
} from '../../../../../shared/scenario';
import { UnitPreference } from '../unit-preference';

/**
 * What every part of the system editor shares: the scenario document as the form holds it, the
 * shared schema's verdict on it (the one source of validation), the issues by field path, the
 * vessel and pump ids the pickers offer, and the reader's units. Provided by the editor page.
 */
@Injectable()
export class EditorState {
  /** The reader's unit system. */
  readonly units = inject(UnitPreference).system;
  /** The scenario document of the form (numbers in SI; empty optional fields left out). */
  readonly document = signal<Record<string, unknown>>({});
  /** True when the reader may only look (viewer access). */
  readonly readOnly = signal(false);

  private readonly parsed = computed(() => parseScenario(this.document()));
  /** The normalised scenario when the document is valid, else null. */
  readonly scenario = computed<Scenario | null>(() => {
    const parsed = this.parsed();
    return parsed.success ? parsed.scenario : null;
  });
  /** Every problem the schema finds, each with the path of its field. */
  readonly issues = computed<readonly ScenarioIssue[]>(() => {
    const parsed = this.parsed();
    return parsed.success ? [] : parsed.issues;
  });
  /**
   * What the drawing shows: the valid scenario, or, while a cross-field rule is broken (say a
   * standpipe taller than its bed), the fields as typed, so the drawing shows the problem.
   */
  readonly drawable = computed<Scenario | null>(
    () => this.scenario() ?? lenientScenario(this.document()),
  );
  /** Vessel ids in file order, for the "to" and "in" pickers. */
  readonly vesselIds = computed(() => this.idsOf('vessels'));
  /** Bed ids in file order, for the fault pickers. */
  readonly bedIds = computed(() => this.idsOf('vessels', 'bed'));
  /** Pump ids in file order, for the schedule. */
  readonly pumpIds = computed(() => this.idsOf('pumps'));
  private readonly messages = computed(() => {
    const byPath = new Map<string, string>();
    for (const issue of this.issues()) {
      const known = byPath.get(issue.path);
      byPath.set(issue.path, known ? `${known} ${issue.message}` : issue.message);
    }
    return byPath;
  });

  /** The schema's message for the field at `path` (e.g. "vessels[1].height"), or null. */
  issueAt(path: string): string | null {
    return this.messages().get(path) ?? null;
  }

  private idsOf(key: 'vessels' | 'pumps', kind?: string): string[] {
    const list = this.document()[key];
    if (!Array.isArray(list)) return [];
    return list.flatMap((item: unknown) => {
      if (typeof item !== 'object' || item === null) return [];
      if (kind !== undefined && !('kind' in item && item.kind === kind)) return [];
      const id = 'id' in item ? item.id : null;
      return typeof id === 'string' && id !== '' ? [id] : [];
    });
  }
}

function lenientScenario(document: Record<string, unknown>): Scenario | null {
  const fields = ScenarioFieldsSchema.safeParse(document);
  if (!fields.success) return null;
  try {
    return normaliseScenario(fields.data);
  } catch {
    return null;
  }
}
