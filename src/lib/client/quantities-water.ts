// The water-removal card's reading of a step and of the quantities answer: whether the step puts
// an acetal or ketal on (so the card is offered), the trap log's own checks, the status and layer
// in plain words, and the points of the plot.

import type { Analysis } from '$lib/client/route-client';
import type { TrapReading, TrapStatus, WaterLayer } from '$lib/quantities/contract';

/**
 * Protecting groups (ids of rules/protecting-groups.json) put on a carbonyl or diol as an acetal or
 * ketal, a condensation that frees water; the names are how the card speaks of them.
 */
export const ACETAL_GROUPS: Record<string, string> = {
	dioxolane: '1,3-dioxolane',
	dioxane: '1,3-dioxane',
	'dimethyl-acetal': 'dimethyl acetal',
	acetonide: 'acetonide',
	benzylidene: 'benzylidene acetal',
	'PMP-acetal': '4-methoxybenzylidene acetal'
};

/**
 * The acetal or ketal a step installs: one the product carries more often than its substrates
 * together, e.g. benzaldehyde → its ethylene acetal gives 'dioxolane'; null while an analysis is
 * missing or when no acetal is new.
 */
export function installedAcetal(
	substrates: (Analysis | undefined)[],
	product: Analysis | undefined
): string | null {
	if (!product || substrates.some((s) => !s)) {
		return null;
	}
	const count = (analyses: (Analysis | undefined)[], id: string) =>
		analyses.reduce(
			(n, a) => n + (a?.protectingGroups.filter((pg) => pg.id === id).length ?? 0),
			0
		);
	return (
		Object.keys(ACETAL_GROUPS).find((id) => count([product], id) > count(substrates, id)) ?? null
	);
}

/** Problems the chemist can fix before asking the server, e.g. a time earlier than the one above. */
export function logProblems(log: TrapReading[]): string[] {
	const problems: string[] = [];
	log.forEach((reading, index) => {
		const previous = log[index - 1];
		if (previous && reading.minutes < previous.minutes) {
			problems.push(
				`Reading ${index + 1}: ${reading.minutes} min comes before reading ${index} (${previous.minutes} min); list readings in time order.`
			);
		}
		if (previous && reading.volume < previous.volume) {
			problems.push(
				`Reading ${index + 1}: ${reading.volume} mL is less than before (${previous.volume} mL); the trap only fills, so record the total collected.`
			);
		}
	});
	return problems;
}

/** The trap status as a sentence, e.g. collecting at 40 % → 'Still collecting: 40 % of …'. */
export function statusText(status: TrapStatus, percent: number, layer: WaterLayer): string {
	const share = `${Math.round(percent)} %`;
	switch (status) {
		case 'collecting':
			return `Still collecting: ${share} of the theoretical water so far. Keep refluxing and read the trap again.`;
		case 'complete':
			return `Complete: the readings have levelled off at ${share} of the theoretical water.`;
		case 'over-theory':
			return `More water than the reaction can give (${share} of theory). The reagents or the solvent were wet, or solvent droplets were read as water: read only the ${layer} layer.`;
	}
}

/** Where the water sits in the trap, and what that means for the trap to use. */
export function layerText(layer: WaterLayer): string {
	return layer === 'lower'
		? 'Water collects as the lower layer: read the volume of the lower layer.'
		: 'Water floats on this solvent (upper layer): use a trap made for solvents denser than water and read the upper layer.';
}

export type PlotPoint = { x: number; y: number };

/** The plot's two lines: the readings, and the theoretical volume across the same time span. */
export function plotLines(
	log: TrapReading[],
	theoreticalVolume: number | undefined
): { collected: PlotPoint[]; theory: PlotPoint[] } {
	const collected = log.map((r) => ({ x: r.minutes, y: r.volume }));
	const end = Math.max(60, ...log.map((r) => r.minutes));
	return {
		collected,
		theory:
			theoreticalVolume === undefined ? [] : [0, end].map((x) => ({ x, y: theoreticalVolume }))
	};
}
