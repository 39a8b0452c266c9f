export { default as RoleBadge } from './RoleBadge.svelte';
