/**
 * A calibration worker thread: runs one fit (dozens of simulations) off the server's event loop
 * and posts the outcome back.
 */
import { performance } from 'node:perf_hooks';
import { parentPort } from 'node:worker_threads';
import { simulate } from '../../../engine/index';
import type {
  CalibrationJobMessage,
  CalibrationWorkerMessage,
} from './calibration-worker-messages';
import { fitCalibration } from './fit-calibration';

const port = parentPort;
if (!port) throw new Error('calibration-worker.ts must be started as a worker thread.');

port.once('message', (job: CalibrationJobMessage) => {
  let message: CalibrationWorkerMessage;
  try {
    message = {
      type: 'done',
      outcome: fitCalibration(job.problem, simulate, job.limits, () => performance.now()),
    };
  } catch (error) {
    message = { type: 'error', message: error instanceof Error ? error.message : String(error) };
  }
  port.postMessage(message);
});
