import type { SystemListItem } from '../../../../../shared/contracts/systems';

/** Rank of a worst verdict for sorting: not run, ok, warning, fails. */
const VERDICT_RANK = { ok: 1, warning: 2, fails: 3 } as const;

/** The value the systems table sorts a column by. */
export function systemSortValue(row: SystemListItem, column: string): string | number {
  switch (column) {
    case 'name':
      return row.name.toLowerCase();
    case 'beds':
      return row.bedsCount;
    case 'pump':
      return row.pumpsMaxFlowM3PerS ?? -1;
    case 'verdict':
      return row.lastVerdict === null ? 0 : VERDICT_RANK[row.lastVerdict];
    case 'updatedAt':
      return Date.parse(row.updatedAt);
    default:
      return '';
  }
}
