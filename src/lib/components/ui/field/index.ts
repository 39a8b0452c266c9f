export { default as TextField } from './TextField.svelte';
export { default as TextArea } from './TextArea.svelte';
export { default as SelectField } from './SelectField.svelte';
