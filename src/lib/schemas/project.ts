import { z } from 'zod';
import { FIELD_LIMITS } from './limits';
import { text } from './text';

const { projectName: NAME, projectDescription: DESCRIPTION } = FIELD_LIMITS;

export const projectName = text()
	.trim()
	.min(NAME.min, `Give the project a name of at least ${NAME.min} characters.`)
	.max(NAME.max, `Keep the name to ${NAME.max} characters.`);

export const projectDescription = text()
	.trim()
	.max(DESCRIPTION.max, `Keep the target description to ${DESCRIPTION.max} characters.`);

/** A new project, as the page form and `POST /api/projects` both take it. */
export const newProjectSchema = z.object({
	teamId: z.uuid('Choose a team.'),
	name: projectName,
	description: projectDescription.default('')
});
