import { z } from 'zod';

/**
 * The two-letter country of a site or a tariff, upper-cased: one rule for both, because the public-holiday
 * calendar a site and its tariff are matched on is keyed by it.
 */
export const countryCode = z
	.string({ error: 'Country is required' })
	.trim()
	.toUpperCase()
	.regex(/^[A-Z]{2}$/, 'Country must be a two-letter code such as US');
