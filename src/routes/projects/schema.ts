export { newProjectSchema as createProjectSchema } from '$lib/schemas/project';
