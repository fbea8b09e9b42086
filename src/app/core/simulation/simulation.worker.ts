/// <reference lib="webworker" />
/**
 * The simulation worker: runs the engine off the main thread so the editor stays responsive.
 * Requests are handled one at a time in arrival order; the page cancels by terminating it.
 */
import { runSimulationRequest } from './run-simulation-request';
import type { SimulationReply, SimulationRequest } from './simulation-messages';

addEventListener('message', (event: MessageEvent<SimulationRequest>) => {
  runSimulationRequest(
    event.data,
    (reply: SimulationReply) => postMessage(reply),
    () => performance.now(),
  );
});
