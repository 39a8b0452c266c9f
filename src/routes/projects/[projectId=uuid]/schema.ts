import { z } from 'zod';
import { projectDescription, projectName } from '$lib/schemas/project';
import { routeName } from '$lib/route/document';

export const editProjectSchema = z.object({
	name: projectName,
	description: projectDescription.default('')
});

export const newRouteSchema = z.object({
	name: routeName
});
