/**
 * The length limits of every free-text field, defined once. Zod schemas, form `maxlength`
 * attributes, services that build names and the database models import them from here, so a
 * limit changes in one place. (Migrations keep their literals: they record what was created.)
 *
 * Lengths count characters as JavaScript does (UTF-16 code units), like `maxlength` and
 * `z.string().max()`, except the password maximum, which counts UTF-8 bytes (bcrypt's input).
 */
export const FIELD_LIMITS = {
	projectName: { min: 2, max: 120 },
	projectDescription: { max: 4000 },
	routeName: { min: 1, max: 120 },
	intermediateLabel: { max: 120 },
	stepReagents: { max: 2000 },
	stepNotes: { max: 10_000 },
	materialName: { max: 200 },
	personName: { max: 120 },
	teamName: { max: 120 },
	tokenLabel: { min: 2, max: 80 },
	commentBody: { min: 1, max: 10_000 },
	reviewNote: { max: 2000 },
	libraryReagents: { max: 2000 },
	librarySolvent: { max: 200 },
	/** Temperature, time and scale of a saved condition ("−78 °C", "2 h", "5 g"). */
	libraryShortText: { max: 100 },
	libraryReference: { max: 500 },
	libraryNotes: { max: 4000 },
	/** bcrypt reads only the first 72 bytes; a longer password would be cut without a word. */
	password: { min: 10, maxBytes: 72 }
} as const;

/** `name` shortened so that `name + suffix` fits in `max`, e.g. `withSuffix(name, ' (copy)', 120)`. */
export function withSuffix(name: string, suffix: string, max: number): string {
	return `${name.slice(0, Math.max(0, max - suffix.length)).trimEnd()}${suffix}`;
}
