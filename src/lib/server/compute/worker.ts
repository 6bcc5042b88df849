import { runTask, type ComputeTask, type TaskOutcome } from './tasks';

/** A compute pool worker (piscina calls the default export once per task). Built to build/compute-worker.js. */
export default function computeTask(task: ComputeTask): TaskOutcome {
	return runTask(task);
}
