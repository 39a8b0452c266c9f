import { z } from 'zod';
import { FIELD_LIMITS } from '$lib/schemas/limits';
import { text } from '$lib/schemas/text';
import { ROLES } from '$lib/policy';

export const addMemberSchema = z.object({
	email: z.email('Enter their e-mail address.'),
	name: text()
		.trim()
		.max(FIELD_LIMITS.personName.max, `Keep the name to ${FIELD_LIMITS.personName.max} characters.`)
		.default(''),
	role: z.enum(ROLES).default('chemist')
});

export const changeRoleSchema = z.object({ membershipId: z.uuid(), role: z.enum(ROLES) });
export const removeMemberSchema = z.object({ membershipId: z.uuid() });
