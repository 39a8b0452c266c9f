/**
 * The rule table: condition classes, protecting-group stability, free-group reactivity and the
 * reagent-text classifier. Pure TypeScript over bundled JSON; no framework imports.
 */
import type { ReagentClassification } from './classify';
import { loadRuleTable } from './table';

export * from './ids';
export type { ReagentClassification, ReagentMatch } from './classify';
export { compileClassifier, HEAT_THRESHOLD_CELSIUS } from './classify';
export { formatIssue, formatPath, formatZodIssues, RuleTableError } from './issues';
export { foldText } from './normalize';
export { parseOverrides, ruleOverridesSchema } from './overrides';
export type { RuleOverrides, RuleOverridesInput } from './overrides';
export * from './schemas';
export { buildRuleTable, loadRuleTable } from './table';
export type { ReactivityAnswer, RuleLayer, RuleTable, StabilityAnswer } from './table';
export { parseRuleFiles, RULE_FILES } from './validate';
export type { RawRuleFiles, RuleData } from './validate';

/** Condition classes a step's reagent text brings, e.g. `conditionsForReagents('TBAF, THF, 0 °C')`. */
export function conditionsForReagents(text: string): ReagentClassification {
	return loadRuleTable().conditionsForReagents(text);
}
