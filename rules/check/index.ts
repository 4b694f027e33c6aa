/** The public face of rules/check/ for the editor. */
export { check } from './check.ts';
