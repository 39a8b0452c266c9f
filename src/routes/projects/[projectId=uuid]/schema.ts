import { z } from 'zod';
import { text } from '$lib/schemas/text';
import { projectDescription, projectName } from '$lib/schemas/project';

export const editProjectSchema = z.object({
	name: projectName,
	description: projectDescription.default('')
});

export const newRouteSchema = z.object({
	name: text()
		.trim()
		.min(1, 'Give the route a name.')
		.max(120, 'Keep the name under 120 characters.')
});
