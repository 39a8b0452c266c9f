import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { protectedStructure } from '../../src/lib/rules/plan/draw';
import { freeUnits } from '../../src/lib/rules/plan/track';
import rows from '../../rules/protecting-groups.json';
import { MODEL_SUBSTRATES as MODELS } from '../factories/model-substrates';

// Every PG the rule table knows is drawn, with its install transform, onto a small invented
// substrate of each group type it protects, and perception must find that PG again, masking that
// group (the transforms and the perception rules agree).
// Structures of the protected forms: common practice (Greene's, 5th ed. — from memory).

describe('drawing protected intermediates', () => {
	for (const row of rows) {
		it(`draws ${row.id} so that perception finds it again`, () => {
			for (const group of row.protects) {
				expect(MODELS[group], `a model substrate for ${group}`).toBeDefined();
				const transform = row.install.transforms.find((t) => t.groups.includes(group))!.smarts;
				const unit = freeUnits(MODELS[group]!).find((u) => u.id === group)!;
				const drawn = protectedStructure(MODELS[group]!, [
					{ pg: row.id, transform, atoms: unit.atoms }
				]);
				const found = perceiveText(drawn).protectingGroups.filter((pg) => pg.id === row.id);
				expect(
					found.map((pg) => pg.masks),
					`${row.id} on ${group}: ${drawn}`
				).toContain(group);
			}
		});
	}

	it("draws a dioxolane in place of a ketone oxygen, editing the chemist's SMILES in place — Greene's (from memory)", () => {
		expect(
			protectedStructure('CC(=O)CCC', [
				{ pg: 'dioxolane', transform: '[C:1]=O>>[C:1]1OCCO1', atoms: [0, 1, 2, 3] }
			])
		).toBe('CC1(OCCO1)CCC');
	});
});
