/** The worker pool sweep cells run on: the run pool's code with the sweep-cell worker, one thread per core. */
import { availableParallelism } from 'node:os';
import { defaultRunPoolOptions, RunPool } from '../runs/run-pool';

/** The sweep-cell worker's module. */
const SWEEP_CELL_WORKER = new URL('./sweep-cell-worker.ts', import.meta.url);

/**
 * A pool of sweep-cell workers, one per core: a sweep is many short runs that want every core,
 * while stored runs keep their own pool (and a core for the web server).
 */
export function makeSweepPool(cores = availableParallelism()): RunPool {
  return new RunPool(
    { ...defaultRunPoolOptions(cores), size: Math.max(1, cores) },
    SWEEP_CELL_WORKER,
  );
}
