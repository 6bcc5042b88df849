import {
	computeLeg,
	computePath,
	fixState,
	isolines,
	ISOLINE_UNITS,
	saturationCurve,
	if97Isolines,
	if97SaturationCurve,
	stateExtras,
	ThermoError,
	transport,
	type FixOptions,
	type Formulation,
	type Inputs,
	type LegSpec,
	type PathSpec
} from '$lib/thermo';

/*
 * The pure engine work behind the compute routes, as plain messages that can cross to a worker
 * thread (structured clone). The routes check, validate and charge each request on the main thread
 * first; a task is only ever built from a validated body. Only the engine and JSON.stringify run
 * here, so the worker bundle (build/compute-worker.js) holds nothing but the engine.
 */

import type { IsolineKind } from '$lib/thermo/types';

export type { IsolineKind };

export type ComputeTask =
	| { kind: 'leg'; spec: LegSpec }
	| { kind: 'path'; spec: PathSpec }
	| { kind: 'state'; fluid: string; inputs: Inputs; options: FixOptions }
	| {
			kind: 'isolines';
			fluid: string;
			line: IsolineKind;
			values: number[];
			points: number;
			formulation?: Formulation;
	  }
	| { kind: 'saturation'; fluid: string; points: number; formulation?: Formulation };

/** The engine's refusal, as plain data (a class does not survive the crossing). */
export type ThermoFailure = ReturnType<ThermoError['toJSON']>;

/** A task's outcome: the answer's JSON text, or the engine's refusal. */
export type TaskOutcome = { json: string } | { refused: ThermoFailure };

function answer(task: ComputeTask): unknown {
	switch (task.kind) {
		case 'leg':
			return { leg: computeLeg(task.spec) };
		case 'path': {
			// each state with its transport properties; the legs' points carry none (see the route)
			const path = computePath(task.spec);
			for (const ps of path.states) ps.transport = transport(ps.state);
			return { path };
		}
		case 'state': {
			const state = fixState(task.fluid, task.inputs, task.options);
			return { state, extras: stateExtras(state), transport: transport(state) };
		}
		case 'isolines':
			return {
				fluid: task.fluid,
				kind: task.line,
				unit: ISOLINE_UNITS[task.line],
				lines:
					task.formulation === 'if97'
						? if97Isolines(task.line, task.values, task.points)
						: isolines(task.fluid, task.line, task.values, task.points)
			};
		case 'saturation':
			return task.formulation === 'if97'
				? if97SaturationCurve(task.points)
				: saturationCurve(task.fluid, task.points);
	}
}

/** Run one task: the answer as JSON text, or the engine's ThermoError as data. Anything else throws. */
export function runTask(task: ComputeTask): TaskOutcome {
	try {
		return { json: JSON.stringify(answer(task)) };
	} catch (e) {
		if (e instanceof ThermoError) return { refused: e.toJSON() };
		throw e;
	}
}
