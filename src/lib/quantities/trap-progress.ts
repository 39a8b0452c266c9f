// How far a water-separating trap has got: the last reading against theory, and whether the
// readings have levelled off.

import type { TrapReading, TrapStatus } from './contract';
import { QuantitiesError } from './errors';
import {
	COMPLETE_PERCENT,
	LEVELLED_INTERVALS,
	LEVELLED_STEP_PERCENT,
	OVER_THEORY_PERCENT
} from './units';

export type TrapProgress = {
	collected: number;
	percent: number;
	status: TrapStatus;
	/** Flat for the last intervals though below COMPLETE_PERCENT: the reaction may have stalled. */
	stalled: boolean;
	/** A reading lower than the one before it (drained and not added back?). */
	fell: boolean;
};

/** Readings must run forward in time, e.g. 0, 30, 60 minutes; throws naming the reading. */
export function checkLogOrder(log: readonly TrapReading[]): void {
	log.forEach((reading, i) => {
		const before = log[i - 1];
		if (before && reading.minutes < before.minutes) {
			throw new QuantitiesError(
				'log_out_of_order',
				`Trap reading ${i + 1} (${reading.minutes} min) comes before reading ${i} (${before.minutes} min); list readings in time order.`,
				{ field: `waterRemoval.log[${i}].minutes`, reading: i }
			);
		}
	});
}

function levelledOff(log: readonly TrapReading[], theoretical: number): boolean {
	if (log.length < LEVELLED_INTERVALS + 1) {
		return false;
	}
	const last = log.slice(-(LEVELLED_INTERVALS + 1));
	return last.every((reading, i) => {
		const before = last[i - 1];
		return (
			!before ||
			(Math.abs(reading.volume - before.volume) / theoretical) * 100 < LEVELLED_STEP_PERCENT
		);
	});
}

/**
 * Progress from readings in mL against the theoretical mL, e.g. 2.9, 3.0, 3.0 mL of 3.0 → complete.
 * Undefined for an empty log.
 */
export function trapProgress(
	log: readonly TrapReading[],
	theoreticalVolume: number
): TrapProgress | undefined {
	checkLogOrder(log);
	const last = log.at(-1);
	if (!last) {
		return undefined;
	}
	const percent = (last.volume / theoreticalVolume) * 100;
	const levelled = levelledOff(log, theoreticalVolume);
	const status: TrapStatus =
		percent > OVER_THEORY_PERCENT
			? 'over-theory'
			: levelled && percent >= COMPLETE_PERCENT
				? 'complete'
				: 'collecting';
	return {
		collected: last.volume,
		percent,
		status,
		stalled: levelled && percent < COMPLETE_PERCENT,
		fell: log.some((reading, i) => i > 0 && reading.volume < log[i - 1]!.volume)
	};
}
