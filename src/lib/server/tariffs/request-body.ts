// The body of a calculation request that carries a tariff: the core's request with the tariff inline, or
// its library variant naming a stored tariff by id.
import { z } from 'zod';
import { calculateRequestSchema, compareRequestSchema, holidaysSchema, timezoneSchema } from '$lib/calc';

/** As the site form says it (and `tariffChoiceProblem`): the same words for any id that names no tariff. */
const PICK_A_TARIFF = 'Pick a tariff from the library';

/** The fields every request that carries a tariff shares (calculate and compare). */
type TariffShape = { tariff: z.ZodType; timezone: z.ZodType; holidays: z.ZodType; period: z.ZodType };

/** A body that names a library tariff carries `tariffId` and no inline `tariff`. */
const namesLibraryTariff = (body: unknown) =>
	!!body && typeof body === 'object' && !Array.isArray(body) && 'tariffId' in body && !('tariff' in body);

/**
 * The request schema, or its library variant: `tariffId` (and `tariffVersion` to pin one) instead of
 * `tariff`, with the time zone and holidays defaulting to the tariff's own. One schema: the body's keys
 * pick the variant, and its issues are reported exactly as the variant's own.
 */
function inlineOrLibrary<S extends z.ZodObject<TariffShape>>(schema: S) {
	// Extended, not rebuilt: the request's own refinements (compare's) hold for the library variant too.
	const library = (schema as z.ZodObject<TariffShape>).safeExtend({
		// The key picks this variant only when `tariff` is absent.
		tariff: z.undefined().optional() as unknown as z.ZodType,
		timezone: timezoneSchema.optional(),
		// Without the schema's default (none), so a body that leaves holidays out gets the tariff's.
		holidays: holidaysSchema.unwrap().optional(),
		tariffId: z.string({ error: PICK_A_TARIFF }).max(100, PICK_A_TARIFF),
		tariffVersion: z
			.number({ error: 'Pinned version must be a whole number' })
			.int('Pinned version must be a whole number')
			.min(1, 'Pinned version must be a whole number from 1')
			.optional()
	});
	type Inline = z.output<S>;
	type Library = Omit<Inline, 'tariff' | 'timezone' | 'holidays'> & {
		timezone?: Inline['timezone'];
		holidays?: Inline['holidays'];
		tariffId: string;
		tariffVersion?: number;
	};
	return z.unknown().transform((body, ctx): { inline: Inline } | { library: Library } | typeof z.NEVER => {
		const variant = namesLibraryTariff(body) ? library : schema;
		const parsed = variant.safeParse(body);
		if (!parsed.success) {
			for (const issue of parsed.error.issues) ctx.addIssue(issue as z.core.$ZodRawIssue);
			return z.NEVER;
		}
		return variant === library ? { library: parsed.data as Library } : { inline: parsed.data as Inline };
	});
}

/** The body of POST /api/v1/calculate: the core's request, with an inline tariff or a library one. */
export const calculateBodySchema = inlineOrLibrary(calculateRequestSchema);

/** The body of POST /api/v1/compare, with an inline tariff or a library one. */
export const compareBodySchema = inlineOrLibrary(compareRequestSchema);
