import { z } from 'zod';
import { text } from './text';

export const projectName = text()
	.trim()
	.min(2, 'Give the project a name of at least 2 characters.')
	.max(120, 'Keep the name under 120 characters.');

export const projectDescription = text()
	.trim()
	.max(4000, 'Keep the target description under 4000 characters.');

/** A new project, as the page form and `POST /api/projects` both take it. */
export const newProjectSchema = z.object({
	teamId: z.uuid('Choose a team.'),
	name: projectName,
	description: projectDescription.default('')
});
