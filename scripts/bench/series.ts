/**
 * The growth series of `npm run bench`: calculate() by devices and by months, compare() by scenarios
 * and the comparison workbook by scenarios × devices.
 */
import { calculate, calculateRequestSchema, compare, compareRequestSchema } from '../../src/lib/calc/index';
import { growth, workbookModules } from './growth';
import { calculation, comparison, equipment } from './requests';

/**
 * A parsed calculation of the generator's first `devices` devices. The two largest sizes lie past what a
 * request may ask (2,000 devices, 36 months): they are parsed within those limits, 2,000 devices at a
 * time, and then widened, to time the core beyond them.
 */
function parsed(devices: number, months = 12) {
	const all = equipment(devices, 1);
	const chunks = Array.from({ length: Math.max(1, Math.ceil(devices / 2000)) }, (_, i) =>
		calculateRequestSchema.parse({
			...calculation(0, 1, Math.min(months, 36)),
			equipment: all.slice(i * 2000, (i + 1) * 2000)
		})
	);
	const [first] = chunks;
	if (!first || !('months' in first.period)) throw new Error('The bench request did not parse');
	return {
		...first,
		period: { ...first.period, months },
		equipment: chunks.flatMap((chunk) => chunk.equipment)
	};
}

/**
 * Runs the four series in turn, each printing its table. Requests are parsed before timing; fewer runs
 * for the big sizes keep the whole bench within about three minutes on a 2-core machine.
 */
export async function growthCurves(): Promise<void> {
	const byDevices = [10, 100, 1000, 10_000].map((devices) => ({ devices, request: parsed(devices) }));
	await growth(
		'Growth: calculate() by devices (12 months)',
		byDevices.map(({ devices, request }) => ({
			label: `${devices.toLocaleString('en-US')} devices`,
			size: devices,
			run: () => calculate(request),
			n: devices >= 10_000 ? 25 : devices >= 1000 ? 50 : 200,
			warmUp: devices >= 10_000 ? 2 : 10
		}))
	);
	const byMonths = [1, 12, 60].map((months) => ({ months, request: parsed(100, months) }));
	await growth(
		'Growth: calculate() by months (100 devices)',
		byMonths.map(({ months, request }) => ({
			label: `${months} month${months === 1 ? '' : 's'}`,
			size: months,
			run: () => calculate(request),
			n: 100,
			warmUp: 10
		}))
	);
	const byScenarios = [2, 6].map((count) => ({
		count,
		request: compareRequestSchema.parse(comparison(count))
	}));
	await growth(
		'Growth: compare() by scenarios (100 devices each, 12 months)',
		byScenarios.map(({ count, request }) => ({
			label: `${count} scenarios`,
			size: count,
			run: () => compare(request),
			n: 100,
			warmUp: 10
		}))
	);
	// The workbook alone: the comparison it carries is computed once, before timing, as the route does
	// before it builds the file.
	const { comparisonWorkbook, exportOf } = await workbookModules();
	const workbooks = [
		[2, 30],
		[6, 200]
	].map(([count = 0, devices = 0]) => ({
		count,
		devices,
		input: exportOf(comparison(count, devices), 'Bench comparison (invented)')
	}));
	await growth(
		'Growth: the comparison workbook by scenarios × devices (12 months)',
		workbooks.map(({ count, devices, input }) => ({
			label: `${count} × ${devices} devices`,
			size: count * devices,
			run: () => comparisonWorkbook(input),
			n: count * devices > 100 ? 20 : 50,
			warmUp: 2
		}))
	);
}
