import { parseRuleFiles, RuleTableError, type RawRuleFiles } from '../../src/lib/rules';
import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';

/** A copy of the bundled rule files for a test to break, e.g. `good().reagents.pop()`. */
export const good = (): RawRuleFiles => structuredClone(DEFAULT_RULE_FILES);

/** The problems the loader reports for a broken copy of the files; throws if the copy loads. */
export function problemsOf(raw: RawRuleFiles): readonly string[] {
	try {
		parseRuleFiles(raw);
	} catch (error) {
		if (error instanceof RuleTableError) {
			return error.problems;
		}
		throw error;
	}
	throw new Error('expected the broken copy to fail');
}
