// Cautions shown beside the numbers. They point at the SDS and local rules; they do not replace them.

import type { Caution } from './contract';
import type { ComputedMaterial } from './materials';
import { OVER_THEORY_PERCENT } from './units';
import type { WaterRemoval } from './water-removal';

/** Beside a step's reagent hazards (step panel, review copy): the hazard notes are not an SDS. */
export const REAGENT_SDS_CAUTION =
	'Check the safety data sheet (SDS) of every reagent and follow your institution’s safety rules before you run this step.';

function layerWords(removal: WaterRemoval): string {
	return removal.azeotrope.waterLayer === 'lower'
		? `the water is the lower layer under ${removal.azeotrope.name.toLowerCase()}`
		: `${removal.azeotrope.name.toLowerCase()} is denser than water, so the water is the upper layer`;
}

function trapCautions(removal: WaterRemoval): Caution[] {
	const { azeotrope, progress, answer } = removal;
	const subject = azeotrope.name;
	const out: Caution[] = [];
	if (azeotrope.flammable) {
		out.push({
			subject,
			message: `${azeotrope.name} is flammable and is heated to reflux: use a heating mantle or bath, no open flame, and never heat a closed system (the condenser must be open to the air or an inert-gas line).`
		});
	}
	if (azeotrope.carcinogen) {
		out.push({
			subject,
			message: `${azeotrope.name} is a ${azeotrope.carcinogen === 'known' ? 'known' : 'suspected'} carcinogen: prefer toluene, cyclohexane or heptane.`
		});
	}
	if (azeotrope.waterLayer === 'upper') {
		out.push({
			subject: 'Trap',
			message: `${layerWords(removal)}: use a trap made for solvents heavier than water, which returns the lower layer to the flask.`
		});
	}
	if (answer.trapFills) {
		out.push({
			subject: 'Trap',
			message: `The theoretical ${answer.theoretical.volume.toFixed(1)} mL of water is more than the trap holds: drain it during the run and record the total collected, drained water included.`
		});
	}
	if (progress?.status === 'over-theory') {
		out.push({
			subject: 'Trap',
			message: `More water than the equation allows (${Math.round(progress.percent)} % of theory, over ${OVER_THEORY_PERCENT} %): the reagents or solvent were wet, or solvent droplets were read as water. Read only the water layer: ${layerWords(removal)}.`
		});
	}
	if (progress?.stalled) {
		out.push({
			subject: 'Trap',
			message: `The readings have levelled off at ${Math.round(progress.percent)} % of theory: the reaction is not complete. Check the reflux rate, the catalyst and that the distillate reaches the trap.`
		});
	}
	if (progress?.fell) {
		out.push({
			subject: 'Trap',
			message:
				'A reading is lower than the one before it: record the total collected, including water drained from the trap.'
		});
	}
	return out;
}

function materialCautions(materials: readonly ComputedMaterial[]): Caution[] {
	const out: Caution[] = [];
	for (const material of materials) {
		const conditions = material.entry?.conditions ?? [];
		if (material.role === 'catalyst' && conditions.some((id) => id.startsWith('acid'))) {
			out.push({
				subject: material.name,
				message: `${material.name} is an acid catalyst and corrosive: wear gloves and eye protection.`
			});
		}
		if (material.entry && /glycol|diol$/i.test(material.entry.name)) {
			out.push({
				subject: material.name,
				message: `${material.name} is toxic if swallowed.`
			});
		}
	}
	return out;
}

/** Every caution for a computed step, the SDS reminder last. */
export function cautionsFor(
	materials: readonly ComputedMaterial[],
	removal?: WaterRemoval
): Caution[] {
	return [
		...materialCautions(materials),
		...(removal ? trapCautions(removal) : []),
		{
			subject: 'Safety',
			message:
				'These notes are reminders, not an assessment: read each material’s SDS and follow your institution’s rules.'
		}
	];
}
