import { describe, expect, it } from 'vitest';
import { FIELD_LIMITS, withSuffix } from '$lib/schemas/limits';
import { newPasswordSchema } from '$lib/schemas/password';
import { newProjectSchema } from '$lib/schemas/project';
import { routeDocumentShape } from '$lib/route/document';
import { changePasswordSchema, createTokenSchema } from '../../src/routes/account/schema';
import { newRouteSchema } from '../../src/routes/projects/[projectId=uuid]/schema';
import { addMemberSchema } from '../../src/routes/teams/[teamId=uuid]/schema';

const TEAM = '00000000-0000-4000-8000-000000000001';
const messages = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
	result.error?.issues.map((issue) => issue.message) ?? [];

describe('a password longer than bcrypt reads', () => {
	// bcrypt hashes only the first 72 UTF-8 bytes: without a maximum, everything after them would
	// be dropped without a word and any password sharing those bytes would sign in.
	const fits = 'x'.repeat(FIELD_LIMITS.password.maxBytes);
	const tooLong = `${fits}y`;
	// 37 × "é" is 37 characters but 74 bytes.
	const accented = 'é'.repeat(37);

	it('is refused with a message when set through a link', () => {
		expect(newPasswordSchema.safeParse({ password: fits, confirm: fits }).success).toBe(true);
		for (const password of [tooLong, accented]) {
			const result = newPasswordSchema.safeParse({ password, confirm: password });
			expect(result.success).toBe(false);
			expect(messages(result).join(' ')).toMatch(/at most 72 characters/);
		}
	});

	it('is refused when changed on the account page', () => {
		const body = { current: 'old password', next: tooLong, confirm: tooLong, revokeTokens: false };
		const result = changePasswordSchema.safeParse(body);
		expect(result.success).toBe(false);
		expect(messages(result).join(' ')).toMatch(/at most 72 characters/);
	});
});

describe('one limit per field, as every schema takes it', () => {
	const over = (limit: number) => 'a'.repeat(limit + 1);

	it('route names: the new-route form and the route document agree', () => {
		const { max } = FIELD_LIMITS.routeName;
		expect(newRouteSchema.safeParse({ name: 'a'.repeat(max) }).success).toBe(true);
		expect(newRouteSchema.safeParse({ name: over(max) }).success).toBe(false);
		const doc = { name: over(max), intermediates: [], steps: [] };
		expect(messages(routeDocumentShape.safeParse(doc))).toEqual([
			`Keep the name to ${max} characters.`
		]);
	});

	it('project names, token labels and member names', () => {
		const project = { teamId: TEAM, name: over(FIELD_LIMITS.projectName.max) };
		expect(newProjectSchema.safeParse(project).success).toBe(false);
		const label = over(FIELD_LIMITS.tokenLabel.max);
		expect(messages(createTokenSchema.safeParse({ label }))).toEqual([
			`Keep the label to ${FIELD_LIMITS.tokenLabel.max} characters.`
		]);
		const member = { email: 'a@example.org', name: over(FIELD_LIMITS.personName.max) };
		expect(addMemberSchema.safeParse(member).success).toBe(false);
	});
});

describe('withSuffix', () => {
	it('keeps the suffix and cuts the name so both fit', () => {
		expect(withSuffix('Grignard', ' (copy)', 120)).toBe('Grignard (copy)');
		const cut = withSuffix('a'.repeat(120), ' (protected)', 120);
		expect(cut).toHaveLength(120);
		expect(cut.endsWith(' (protected)')).toBe(true);
		// No space is left dangling before the suffix.
		expect(withSuffix('ab cd', ' (x)', 7)).toBe('ab (x)');
	});
});
