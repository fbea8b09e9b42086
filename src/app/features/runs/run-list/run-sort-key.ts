import type { Sort } from '@angular/material/sort';
import type { RunListQuery } from '../../../../../shared/contracts/runs';

/** Columns the server can sort the runs by. */
const SERVER_SORTS = ['createdAt', 'durationS', 'verdict', 'status'] as const;

/** The server's sort key for a table sort: `-` for descending; newest first when unsorted. */
export function runSortKey(sort: Sort): RunListQuery['sort'] {
  const column = SERVER_SORTS.find((key) => key === sort.active);
  if (!column || sort.direction === '') return '-createdAt';
  return sort.direction === 'desc' ? `-${column}` : column;
}
