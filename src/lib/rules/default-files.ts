/**
 * The bundled rule files. Static JSON imports, so Vite bundles them into the server build and
 * tests and scripts read the same data; nothing touches the file system at runtime.
 */
import conditions from '../../../rules/conditions.json';
import preferences from '../../../rules/preferences.json';
import protectingGroups from '../../../rules/protecting-groups.json';
import reactivity from '../../../rules/reactivity.json';
import reagents from '../../../rules/reagents.json';
import type { RawRuleFiles } from './validate';

export const DEFAULT_RULE_FILES: RawRuleFiles = {
	conditions,
	reagents,
	reactivity,
	protectingGroups,
	preferences
};
