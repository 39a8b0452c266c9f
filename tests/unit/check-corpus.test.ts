// The regression corpus of issue 11: literature steps as a chemist writes them, each with what the
// clash check must say about the groups that stand by, and the source of that claim. The
// structures are checked in RDKit first (readable, and the subject really is there on both sides)
// and Orthogon's perception must see every subject, so a step cannot pass because a group was not
// perceived. tests/corpus/README.md explains the format.

import { beforeAll, describe, expect, it } from 'vitest';
import type { MainModule } from '@rdkit/rdkit';
import { checkStep, type Clash, type StepCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { perceptionRules } from '../../src/lib/chem/patterns';
import { perceiveText } from '../../src/lib/chem/perception-cache';
import { FREE_GROUP_IDS, PROTECTING_GROUP_IDS } from '../../src/lib/rules/ids';
import { rdkit, rdkitMatches } from '../reference/rdkit';
import {
	TOPICS,
	fallbackSmarts,
	isTrueClash,
	loadCorpus,
	meets,
	substrates,
	verdictOn,
	type CorpusStep
} from '../corpus/corpus';

const steps = loadCorpus();
const rules = checkRulesFrom();
const perception = perceptionRules();

let RDKit: MainModule;
beforeAll(async () => {
	RDKit = await rdkit();
});

/** The rule files' SMARTS for a subject, else the corpus's own for ids other branches bring. */
function smartsFor(subject: string): string[] | undefined {
	const group = perception.groups.find((g) => g.id === subject);
	if (group) {
		return [group.smarts];
	}
	const pg = perception.protectingGroups.find((p) => p.id === subject);
	return pg ? pg.patterns : fallbackSmarts[subject];
}

const presentIn = (smiles: string, patterns: string[]) =>
	patterns.some((smarts) => rdkitMatches(RDKit, smiles, smarts).length > 0);

describe('how an answer is read against a step', () => {
	const on = (severity: Clash['severity'], subject = 'TBS'): Clash => ({
		severity,
		subject,
		kind: 'removes-protecting-group',
		condition: 'fluoride',
		atoms: [],
		message: ''
	});
	it('takes the harshest severity on the subject and ignores other subjects', () => {
		expect(verdictOn([on('caution'), on('clash')], 'TBS')).toBe('clash');
		expect(verdictOn([on('caution'), on('clash', 'Bn')], 'TBS')).toBe('caution');
		expect(verdictOn([on('clash', 'Bn')], 'TBS')).toBe('quiet');
	});
	it('lets `not-clash` accept a caution but `quiet` accept nothing', () => {
		expect(meets('not-clash', 'caution')).toBe(true);
		expect(meets('not-clash', 'clash')).toBe(false);
		expect(meets('quiet', 'caution')).toBe(false);
		expect(meets('clash', 'caution')).toBe(false);
	});
});

describe('the corpus', () => {
	it('has at least 80 steps, each id once', () => {
		expect(steps.length).toBeGreaterThanOrEqual(80);
		const ids = steps.map((s) => s.id);
		expect(ids.filter((id, i) => ids.indexOf(id) !== i)).toEqual([]);
	});
	it('is at least half routine steps that must stay quiet and at least a quarter true clashes', () => {
		const trueClashes = steps.filter(isTrueClash).length;
		expect(steps.length - trueClashes).toBeGreaterThanOrEqual(steps.length / 2);
		expect(trueClashes).toBeGreaterThanOrEqual(steps.length / 4);
	});
	it('covers every pattern of issue 11 with at least three steps', () => {
		const thin = TOPICS.filter((topic) => steps.filter((s) => s.topic === topic).length < 3);
		expect(thin).toEqual([]);
	});
	it('names only subjects that are known group or protecting-group ids, each with a SMARTS', () => {
		const known = new Set<string>([
			...FREE_GROUP_IDS,
			...PROTECTING_GROUP_IDS,
			...Object.keys(fallbackSmarts)
		]);
		const subjects = steps.flatMap((s) => [...s.expect.map((e) => e.subject), ...(s.absent ?? [])]);
		expect([...new Set(subjects.filter((id) => !known.has(id) || !smartsFor(id)))]).toEqual([]);
	});
	it('puts every group and protecting group new in issue 11 to work in some step', () => {
		const used = new Set(steps.flatMap((s) => s.expect.map((e) => e.subject)));
		expect(Object.keys(fallbackSmarts).filter((id) => !used.has(id))).toEqual([]);
	});
});

describe.each(steps.filter((s) => s.absent))('$id', (step) => {
	it('is not perceived to hold what it does not hold', () => {
		const seen = substrates(step).flatMap((text) => perceiveText(text).groups.map((g) => g.id));
		expect(
			step.absent!.filter((id) => seen.includes(id)),
			`step ${step.id}`
		).toEqual([]);
	});
});

describe.each(steps)('$id', (step) => {
	it('has structures RDKit reads, with every subject there before and after the step', () => {
		const problems: string[] = [];
		for (const smiles of [...substrates(step), step.product]) {
			const mol = RDKit.get_mol(smiles);
			if (!mol?.is_valid()) {
				problems.push(`RDKit cannot read ${smiles}`);
			}
			mol?.delete();
		}
		if (problems.length === 0) {
			const before = substrates(step).join('.');
			for (const { subject } of step.expect) {
				if (step.absent?.includes(subject)) {
					continue;
				}
				const patterns = smartsFor(subject) ?? [];
				if (!presentIn(before, patterns)) {
					problems.push(`${subject} is not in the substrate`);
				}
				if (!presentIn(step.product, patterns)) {
					problems.push(`${subject} is not in the product`);
				}
			}
		}
		expect(problems, `step ${step.id} (${step.source})`).toEqual([]);
	});

	it('is perceived by Orthogon to hold every subject, so a quiet answer means something', () => {
		const seen = new Set(
			substrates(step).flatMap((text) => {
				const perceived = perceiveText(text);
				return [...perceived.groups, ...perceived.protectingGroups].map((site) => site.id);
			})
		);
		const unseen = step.expect
			.map((e) => e.subject)
			.filter((subject) => !step.absent?.includes(subject) && !seen.has(subject));
		expect(unseen, `step ${step.id}: perception misses these subjects`).toEqual([]);
	});

	it(`is checked as the literature says — ${step.source}`, () => {
		const { answer, failures } = judge(step);
		expect(failures, failures.length ? report(step, failures, answer) : '').toEqual([]);
	});
});

/** The check's answer on a step and, one line each, where it disagrees with the step. */
function judge(step: CorpusStep): { answer: StepCheck | null; failures: string[] } {
	let answer: StepCheck;
	try {
		answer = checkStep(rules, {
			id: step.id,
			substrate: step.substrate,
			product: step.product,
			reagents: step.reagents
		});
	} catch (caught) {
		const message = caught instanceof Error ? caught.message : String(caught);
		return { answer: null, failures: [`the check failed: ${message}`] };
	}
	if (answer.error) {
		return { answer, failures: [`the check could not run: ${answer.error.message}`] };
	}
	const failures = step.expect
		.map(({ subject, outcome }) => ({
			subject,
			outcome,
			verdict: verdictOn(answer.clashes, subject)
		}))
		.filter(({ outcome, verdict }) => !meets(outcome, verdict))
		.map(
			({ subject, outcome, verdict }) => `${subject}: expected ${outcome}, came back ${verdict}`
		);
	for (const text of step.unrecognized ?? []) {
		if (!answer.unrecognized.some((entry) => entry.includes(text))) {
			failures.push(`"${text}" should be listed as not recognised`);
		}
	}
	return { answer, failures };
}

function report(step: CorpusStep, failures: string[], answer: StepCheck | null): string {
	const said = answer
		? [
				`conditions: ${answer.conditions.join(', ') || '(none)'}`,
				...answer.clashes.map(
					(c) => `${c.severity} on ${c.subject} (${c.condition}): ${c.message}`
				),
				`not recognised: ${answer.unrecognized.join(' | ') || '(nothing)'}`
			]
		: ['(no answer)'];
	return [
		`step ${step.id} [${step.topic}] — ${step.reagents}`,
		`source: ${step.source}`,
		...failures.map((f) => `  ${f}`),
		'the check said:',
		...said.map((line) => `  ${line}`)
	].join('\n');
}
