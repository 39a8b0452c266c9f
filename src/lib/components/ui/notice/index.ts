export { default as Notice } from './Notice.svelte';
