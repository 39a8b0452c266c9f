// In which order smarts-match.ts places a query's atoms. A walk that starts on the query's rarest
// atom in this molecule (Si of a silyl PG, the halogen of an alkyl halide) meets few candidates,
// and a query atom whose elements the molecule lacks ends the search before it starts. So each
// query can be walked from any of its atoms: one plan per starting atom, made once and kept.

import type { AtomTest, ExactQuery } from './smarts-query';

/** The query atoms in placing order; each after a neighbour placed earlier (`from`), plus its other bonds back. */
export type SearchPlan = {
	order: number[];
	/** Per step: the query atom it is bonded to that is already placed (-1 for the first). */
	from: number[];
	/** Per step: bond bits allowed on that bond. */
	bond: number[];
	/** Per step: its bonds to other atoms already placed (ring closures in this order). */
	back: { other: number; bond: number }[][];
};

const plans = new WeakMap<ExactQuery, (SearchPlan | undefined)[]>();
const leafOrders = new WeakMap<ExactQuery, { before: Int32Array; after: Int32Array }>();
const elementSets = new WeakMap<ExactQuery, (number[] | null)[]>();

/** The plan that places `root` first (and every other atom after a bonded one), e.g. `searchPlan(query, 0)`. */
export function searchPlan(query: ExactQuery, root: number): SearchPlan {
	let cached = plans.get(query);
	if (!cached) {
		plans.set(query, (cached = []));
	}
	return (cached[root] ??= buildPlan(query, root));
}

/** For each query atom, the elements it can be (null: not known from its test), e.g. `[Cl,Br,I]` → [17, 35, 53]. */
export function queryElements(query: ExactQuery): (number[] | null)[] {
	let sets = elementSets.get(query);
	if (!sets) {
		elementSets.set(query, (sets = query.atoms.map(elementsOf)));
	}
	return sets;
}

/**
 * Interchangeable leaves: atoms on the same parent by the same bond, with the same test and map
 * number and nothing bonded to them further (the three methyls of a tert-butyl). Any mapping
 * with them permuted covers the same atoms, and the first in ascending order has them ascending,
 * so a search that keeps only that order loses nothing perception uses. `before[q]` is the
 * sibling q must come after (-1: none), `after[q]` the one it must come before.
 */
export function leafOrder(query: ExactQuery): { before: Int32Array; after: Int32Array } {
	let order = leafOrders.get(query);
	if (order) {
		return order;
	}
	const count = query.atoms.length;
	order = { before: new Int32Array(count).fill(-1), after: new Int32Array(count).fill(-1) };
	const inner = new Set<number>(query.parent.filter((parent) => parent >= 0));
	query.closures.forEach((closures, atom) => {
		if (closures.length > 0) {
			inner.add(atom);
		}
		closures.forEach(({ other }) => inner.add(other));
	});
	const lastOfKind = new Map<string, number>();
	for (let atom = 1; atom < count; atom++) {
		if (inner.has(atom)) {
			continue;
		}
		const kind = JSON.stringify([
			query.parent[atom],
			query.parentBond[atom],
			query.mapNumbers[atom],
			query.atoms[atom]
		]);
		const previous = lastOfKind.get(kind);
		if (previous !== undefined) {
			order.before[atom] = previous;
			order.after[previous] = atom;
		}
		lastOfKind.set(kind, atom);
	}
	leafOrders.set(query, order);
	return order;
}

function elementsOf(test: AtomTest): number[] | null {
	if (test.kind === 'element') {
		return [test.element];
	}
	if (test.kind === 'any') {
		const parts = test.tests.map(elementsOf);
		return parts.every((part) => part !== null) ? [...new Set(parts.flat() as number[])] : null;
	}
	if (test.kind !== 'all') {
		return null;
	}
	let narrowest: number[] | null = null;
	for (const part of test.tests) {
		const elements = elementsOf(part);
		if (elements && (!narrowest || elements.length < narrowest.length)) {
			narrowest = elements;
		}
	}
	return narrowest;
}

function buildPlan(query: ExactQuery, root: number): SearchPlan {
	const count = query.atoms.length;
	const edges: { other: number; bond: number }[][] = Array.from({ length: count }, () => []);
	const link = (a: number, b: number, bond: number) => {
		edges[a]!.push({ other: b, bond });
		edges[b]!.push({ other: a, bond });
	};
	for (let atom = 1; atom < count; atom++) {
		link(atom, query.parent[atom]!, query.parentBond[atom]!);
	}
	query.closures.forEach((closures, atom) =>
		closures.forEach(({ other, bond }) => link(atom, other, bond))
	);
	const plan: SearchPlan = { order: [], from: [], bond: [], back: [] };
	const placedAt = new Array<number>(count).fill(-1);
	// Depth first from the root, so each atom is placed right after the atom that leads to it.
	const stack: { atom: number; from: number; bond: number }[] = [{ atom: root, from: -1, bond: 0 }];
	while (stack.length > 0) {
		const { atom, from, bond } = stack.pop()!;
		if (placedAt[atom]! >= 0) {
			continue;
		}
		placedAt[atom] = plan.order.length;
		plan.order.push(atom);
		plan.from.push(from);
		plan.bond.push(bond);
		plan.back.push(edges[atom]!.filter(({ other }) => other !== from && placedAt[other]! >= 0));
		for (let i = edges[atom]!.length - 1; i >= 0; i--) {
			const { other, bond: next } = edges[atom]![i]!;
			if (placedAt[other]! < 0) {
				stack.push({ atom: other, from: atom, bond: next });
			}
		}
	}
	return plan;
}
