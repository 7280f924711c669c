import { ELECTRICAL_CAUTION } from '$lib/cautions';
import { comparisonFromQuery } from '$lib/server/compare/request';
import { exportFileName } from '$lib/server/compare/file-name';
import { comparisonWorkbook } from '$lib/server/exports/comparison-workbook';
import { download } from '$lib/server/exports/download';
import { waterAirScenarios } from '$lib/server/exports/water-air-inputs';
import type { RequestHandler } from './$types';

/** GET …/export.xlsx?… — the comparison as a workbook that recalculates; viewers may export. */
export const GET: RequestHandler = async (event) => {
	const found = await comparisonFromQuery(event);
	if (!found.ok) return found.response;
	const { report, request, stored } = found.comparison;
	const sites = [...new Set(report.scenarios.map((s) => s.siteName))];
	const workbook = await comparisonWorkbook({
		title: sites.join(', '),
		generatedAt: new Date().toISOString(),
		request,
		response: report.result,
		scenarios: report.scenarios.map((s) => ({
			siteName: s.siteName,
			tariffName: s.tariffName,
			tariffVersion: s.tariffVersion,
			tariffOrigin: {
				utility: s.tariffUtility,
				effectiveFrom: s.tariffEffectiveFrom,
				effectiveTo: s.tariffEffectiveTo,
				source: s.tariffSource,
				checkedOn: s.tariffCheckedOn,
				urdbLabel: s.tariffUrdbLabel
			}
		})),
		emissionSource: report.query.emissionSource || 'Not given',
		cautions: report.scenarios.some((s) => s.caution) ? [ELECTRICAL_CAUTION] : [],
		waterAir: waterAirScenarios(report, stored)
	});
	return download(new Uint8Array(workbook), exportFileName(report, 'comparison'), 'xlsx');
};
