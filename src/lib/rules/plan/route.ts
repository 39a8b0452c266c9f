// Writes a joint choice out as a route document: the original steps run on protected
// intermediates, with an install step on the intermediate that the first attacking step uses and
// a removal step (shared when conditions match) where the chosen option takes each PG off. Branches of
// a convergent route get their own protection steps before the step that joins them.

import type { RouteDocument, RouteIntermediate, RouteStep } from '../../route/document';
import { FIELD_LIMITS, withSuffix } from '../../schemas/limits';
import { protectedStructure } from './draw';
import { installsBefore } from './exposure';
import { installKey } from './conflict';
import type { RouteTree } from './tree';
import type { Need, Option, Protection, StepRecipe } from './types';

export type Drawn = {
	route: RouteDocument;
	protections: Protection[];
	merged: string[][];
	shared: { pg: string; count: number }[];
};

/** The protected route for one option per need, e.g. TBS on before step "s2" and off after "s3". */
export function drawRoute(
	doc: RouteDocument,
	tree: RouteTree,
	needs: Need[],
	options: Option[]
): Drawn {
	const taken = new Set([...doc.intermediates.map((n) => n.id), ...doc.steps.map((s) => s.id)]);
	const fresh = (base: string) => {
		let id = base.slice(0, 56);
		for (let i = 2; taken.has(id); i++) {
			id = `${base.slice(0, 56)}-${i}`;
		}
		taken.add(id);
		return id;
	};
	const place = (x: number, node: string) => needs[x]!.path.indexOf(node);
	// A label says which protecting groups an intermediate carries, so a drawn compound never
	// passes under the name of the unprotected one.
	const labelAt = (node: RouteIntermediate, active: number[]) => {
		const base = node.label ?? node.id;
		const pgs = [...new Set(active.map((x) => options[x]!.pg))];
		const max = FIELD_LIMITS.intermediateLabel.max;
		// The base is cut, not the list: the protecting groups are what the label is for.
		return pgs.length ? withSuffix(base, ` (with ${pgs.join(', ')})`, max) : base.slice(0, max);
	};
	const structureAt = (node: string, active: number[]) =>
		protectedStructure(
			tree.byId.get(node)!.structure,
			active.map((x) => ({
				pg: options[x]!.pg,
				transform: options[x]!.transform,
				atoms: needs[x]!.atomsAt.get(node)!
			}))
		);
	const intermediates: RouteIntermediate[] = [];
	const steps: RouteStep[] = [];
	const protections: Protection[] = [];
	const merged: string[][] = [];
	const shared: { pg: string; count: number }[] = [];
	// The id each intermediate goes on as, once its protection steps have run.
	const latest = new Map<string, string>();
	const all = needs.map((_, x) => x);
	for (const node of tree.nodes) {
		const made = tree.made.get(node.id);
		if (made) {
			steps.push({ ...made, from: made.from.map((id) => latest.get(id)!) });
		}
		// Masks that arrive with the intermediate: on before it, not yet off.
		let active = all.filter(
			(x) =>
				place(x, needs[x]!.installAt) < place(x, node.id) &&
				place(x, node.id) <= place(x, options[x]!.removeAt)
		);
		intermediates.push({
			...node,
			label: labelAt(node, active),
			structure: structureAt(node.id, active)
		});
		let current = node.id;
		const installs = new Map<string, number[]>();
		// Amines go on first where several PGs go on here (see `installsBefore`).
		const here = all.filter((i) => needs[i]!.installAt === node.id);
		here.sort((a, b) => (installsBefore(needs, a, b) ? -1 : installsBefore(needs, b, a) ? 1 : 0));
		for (const x of here) {
			const key = installKey(needs[x]!, options[x]!);
			installs.set(key, [...(installs.get(key) ?? []), x]);
		}
		for (const batch of installs.values()) {
			active = [...active, ...batch];
			const option = options[batch[0]!]!;
			const id = fresh(`${node.id}-${option.pg}`);
			intermediates.push({
				id,
				label: labelAt(node, active),
				structure: structureAt(node.id, active)
			});
			steps.push({
				id: fresh(`protect-${option.pg}`),
				from: [current],
				to: id,
				reagents: option.install.reagents,
				conditions: [...option.install.conditions],
				intent: 'protect',
				notes: 'Added by the planner.',
				...savedConditionOf(option.install)
			});
			current = id;
			if (batch.length > 1) {
				shared.push({ pg: option.pg, count: batch.length });
			}
			for (const x of batch) {
				const need = needs[x]!;
				const chosen = options[x]!;
				protections.push({
					group: need.group,
					atoms: need.atomsAt.get(node.id)!,
					intermediate: id,
					protectingGroup: chosen.pg,
					install: {
						before: tree.next.get(node.id)!.id,
						...chosen.install,
						conditions: [...chosen.install.conditions]
					},
					removal: {
						after: chosen.removeAt === tree.target ? 'end' : tree.made.get(chosen.removeAt)!.id,
						...chosen.removal,
						conditions: [...chosen.removal.conditions]
					}
				});
			}
		}
		const batches = new Map<string, number[]>();
		for (const x of active.filter((i) => options[i]!.removeAt === node.id)) {
			// A team's saved condition is for its own PG: it shares a step only with the same entry.
			const { conditions, savedCondition } = options[x]!.removal;
			const key = `${[...conditions].sort().join('+')}\u0001${savedCondition ?? ''}`;
			batches.set(key, [...(batches.get(key) ?? []), x]);
		}
		for (const batch of batches.values()) {
			active = active.filter((x) => !batch.includes(x));
			const removal = options[batch[0]!]!.removal;
			const id = fresh(`${node.id}-free`);
			intermediates.push({
				id,
				label: labelAt(node, active),
				structure: structureAt(node.id, active)
			});
			steps.push({
				id: fresh(`remove-${batch.map((x) => options[x]!.pg).join('-')}`),
				from: [current],
				to: id,
				reagents: removal.reagents,
				conditions: [...removal.conditions],
				intent: 'deprotect',
				notes: 'Added by the planner.',
				...savedConditionOf(removal)
			});
			if (batch.length > 1) {
				merged.push(batch.map((x) => options[x]!.pg));
			}
			current = id;
		}
		latest.set(node.id, current);
	}
	// Intermediates on no step are the chemist's notes: they stay as they were.
	const loose = doc.intermediates.filter((n) => !tree.next.has(n.id) && !tree.made.has(n.id));
	return {
		route: {
			name: withSuffix(doc.name, ' (protected)', FIELD_LIMITS.routeName.max),
			intermediates: [...intermediates, ...loose],
			steps
		},
		protections,
		merged,
		shared
	};
}

/** The route step's link to the team's saved condition it follows, if any. */
const savedConditionOf = (recipe: StepRecipe): Pick<RouteStep, 'savedCondition'> =>
	recipe.savedCondition ? { savedCondition: recipe.savedCondition } : {};
