import { z } from 'zod';
import { projectDescription, projectName } from '$lib/schemas/project';

export const editProjectSchema = z.object({
	name: projectName,
	description: projectDescription.default('')
});
