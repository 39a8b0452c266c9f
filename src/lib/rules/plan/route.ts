// Writes a joint choice out as a route document: the original steps run on protected
// intermediates, with an install step before the first step that would attack each group and a
// removal step (shared when conditions match) where it must be free again.

import type { RouteDocument, RouteIntermediate, RouteStep } from '../../route/document';
import type { Chain } from './chain';
import { protectedStructure } from './draw';
import { installKey } from './search';
import type { Need, Option, Protection } from './types';

export type Drawn = { route: RouteDocument; protections: Protection[]; merged: string[][]; shared: { pg: string; count: number }[] };

/** The protected route for one option per need, e.g. TBS on before step "s2" and off after "s3". */
export function drawRoute(doc: RouteDocument, chain: Chain, needs: Need[], options: Option[]): Drawn {
	const taken = new Set([...doc.intermediates.map((n) => n.id), ...doc.steps.map((s) => s.id)]);
	const fresh = (base: string) => {
		let id = base.slice(0, 56);
		for (let i = 2; taken.has(id); i++) id = `${base.slice(0, 56)}-${i}`;
		taken.add(id);
		return id;
	};
	const n = chain.steps.length;
	const structureAt = (k: number, active: number[]) =>
		protectedStructure(chain.nodes[k]!.structure, active.map((x) => ({ pg: options[x]!.pg, transform: options[x]!.transform, atoms: needs[x]!.atomsAt.get(k)! })));
	const intermediates: RouteIntermediate[] = [];
	const steps: RouteStep[] = [];
	const protections: Protection[] = [];
	const merged: string[][] = [];
	const shared: { pg: string; count: number }[] = [];
	let active: number[] = [];
	let current = chain.nodes[0]!.id;
	intermediates.push({ ...chain.nodes[0]! });
	for (let gap = 0; gap <= n; gap++) {
		const node = chain.nodes[gap]!;
		const installs = new Map<string, number[]>();
		for (const x of needs.map((_, i) => i).filter((i) => needs[i]!.installGap === gap)) {
			const key = installKey(needs[x]!, options[x]!);
			installs.set(key, [...(installs.get(key) ?? []), x]);
		}
		for (const batch of installs.values()) {
			active = [...active, ...batch];
			const option = options[batch[0]!]!;
			const id = fresh(`${node.id}-${option.pg}`);
			intermediates.push({ id, label: `${node.label ?? node.id}, ${option.pg}-protected`, structure: structureAt(gap, active) });
			steps.push({ id: fresh(`protect-${option.pg}`), from: [current], to: id, reagents: option.install.reagents, conditions: [...option.install.conditions], intent: 'protect', notes: 'Added by the planner.' });
			current = id;
			if (batch.length > 1) shared.push({ pg: option.pg, count: batch.length });
			for (const x of batch) {
				const chosen = options[x]!;
				protections.push({
					group: needs[x]!.group,
					atoms: needs[x]!.atomsAt.get(gap)!,
					intermediate: id,
					protectingGroup: chosen.pg,
					install: { before: chain.steps[gap]!.id, ...chosen.install, conditions: [...chosen.install.conditions] },
					removal: { after: needs[x]!.freeGap === n ? 'end' : chain.steps[needs[x]!.freeGap - 1]!.id, ...chosen.removal, conditions: [...chosen.removal.conditions] }
				});
			}
		}
		const leaving = needs.map((_, x) => x).filter((x) => needs[x]!.freeGap === gap && active.includes(x));
		const batches = new Map<string, number[]>();
		for (const x of leaving) {
			const key = [...options[x]!.removal.conditions].sort().join('+');
			batches.set(key, [...(batches.get(key) ?? []), x]);
		}
		for (const batch of batches.values()) {
			active = active.filter((x) => !batch.includes(x));
			const removal = options[batch[0]!]!.removal;
			const id = fresh(`${node.id}-free`);
			intermediates.push({ id, label: `${node.label ?? node.id} without ${batch.map((x) => options[x]!.pg).join(', ')}`, structure: structureAt(gap, active) });
			steps.push({ id: fresh(`remove-${batch.map((x) => options[x]!.pg).join('-')}`), from: [current], to: id, reagents: removal.reagents, conditions: [...removal.conditions], intent: 'deprotect', notes: 'Added by the planner.' });
			if (batch.length > 1) merged.push(batch.map((x) => options[x]!.pg));
			current = id;
		}
		if (gap === n) break;
		const step = chain.steps[gap]!;
		const next = chain.nodes[gap + 1]!;
		intermediates.push({ ...next, structure: structureAt(gap + 1, active) });
		steps.push({ ...step, from: [current] });
		current = next.id;
	}
	return { route: { name: `${doc.name} (protected)`.slice(0, 120), intermediates, steps }, protections, merged, shared };
}
