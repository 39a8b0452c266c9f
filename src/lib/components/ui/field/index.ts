export { default as Field } from './Field.svelte';
export type { FieldControl } from './Field.svelte';
export { default as TextField } from './TextField.svelte';
export { default as TextArea } from './TextArea.svelte';
export { default as SelectField } from './SelectField.svelte';
export { default as CheckboxField } from './CheckboxField.svelte';
export { default as NumberField } from './NumberField.svelte';
