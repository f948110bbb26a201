/**
 * Version of the scoring rules. Every stored result carries it, so an approved revision keeps
 * the numbers it was approved with. Bump it whenever a change alters any result.
 */
export const RULES_VERSION = "2026.12.2";
