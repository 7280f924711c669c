/**
 * The version of the calculation rules. Stored results (a scenario's priced year, a comparison) carry the
 * version they were priced under, and a stored result of another version is priced again on its next
 * read: bump it when a rule changes, so no figure priced under the old rule is served.
 * `rules-version.test.ts` notices a changed rule by a fingerprint of fixed requests' results.
 */
export const RULES_VERSION = 1;
