/**
 * Runrate's calculation core: pure TypeScript that runs on the server and in the browser. The HTTP
 * routes parse a body with `parseRequest(schema, json)` and hand the result to `calculate`, `compare`
 * or `pumping`.
 */
export { calculate } from './calculate';
export { compare } from './compare';
export { RULES_VERSION } from './rules-version';
export {
	airInjectionPressure,
	hazenWilliamsHeadLossM,
	hydraulicWatts,
	pumpInputPower,
	pumping
} from './pumping';
export type { AirPressure, PumpPower, PumpingResponse } from './pumping';
export { FITTING_K, FITTING_KINDS, fittingsHeadM } from './pipe-fittings';
export type { FittingKind } from './pipe-fittings';
export {
	colebrookFrictionFactor,
	darcyWeisbach,
	reynoldsNumber,
	ROUGHNESS_MM,
	swameeJainFrictionFactor
} from './pipe-friction';
export { distinctBy, MAX_REPORTED_ISSUES, parseRequest, reportable } from './parse';
export type { InvalidRequest, ParseResult, RequestIssue } from './parse';
export { roundMoney } from './rounding';
export { unitWatts } from './power';
export { FLOW_UNITS, LENGTH_UNITS } from './units';
export type { FlowUnit, Fluid, LengthUnit } from './units';

export {
	calculateRequestSchema,
	compareRequestSchema,
	oneOffCostSchema,
	SCENARIO_STATUSES
} from './request.schema';
export { holidaysSchema, periodSchema, timezoneSchema } from './period.schema';
export type {
	CalculateRequest,
	CalculateRequestInput,
	CompareRequest,
	CompareRequestInput,
	OneOffCost,
	Scenario,
	ScenarioStatus
} from './request.schema';
export type { Period } from './period.schema';
export { EQUIPMENT_CATEGORIES, equipmentSchema, powerSchema, scheduleSchema } from './equipment.schema';
export type { Equipment, EquipmentInput, Power, Schedule } from './equipment.schema';
export { tariffSchema } from './tariff.schema';
export { MAX_METER_VALUES, type Meter, meterSchema } from './meter.schema';
export { meterCoverageIssues } from './meter';
export type { DemandCharge, EnergyCharge, FixedCharge, Tariff, TariffInput } from './tariff.schema';
export {
	airSchema,
	FRICTION_METHODS,
	fittingSchema,
	pumpSchema,
	pumpingRequestSchema
} from './pumping.schema';
export type {
	Air,
	Fitting,
	FrictionMethod,
	Pump,
	PumpingRequest,
	PumpingRequestInput
} from './pumping.schema';
export { airliftRequestSchema } from './airlift.schema';
export type { AirliftRequest, AirliftRequestInput } from './airlift.schema';
export { aerationRequestSchema } from './aeration.schema';
export type { AerationRequest, AerationRequestInput } from './aeration.schema';
export {
	aerationInputFrom,
	airliftInputFrom,
	flowToLpm,
	PRESSURE_UNITS,
	pressureToKPa
} from './air-requests';
export type { PressureUnit } from './air-requests';
export type * from './types';
export { calculateAcrossVersions, NoVersionInForce, versionInForce } from './versions';
export type { DatedTariff, VersionedResponse } from './versions';
export {
	airDesignSchema,
	aerationDesignSchema,
	airliftSchema,
	airPumpSchema,
	DEPTH_UNITS,
	DIFFUSER_KINDS,
	pumpPointSchema,
	RISER_DIAMETER_UNITS,
	transferFactorsShape
} from './air-design.schema';
export type {
	AerationDesign,
	AirDesign,
	AirDesignInput,
	Airlift,
	AirPump,
	AirPumpInput,
	DiffuserKind,
	PumpPoint
} from './air-design.schema';
export { airlift, nicklinAirM3PerS, nicklinWaterM3PerS } from './airlift';
export type { AirliftInput, AirliftResult, Warning } from './airlift';
export { riserCurve, riserWaterFlowM3PerS, RISER_FANNING_FACTOR } from './riser';
export type { CurvePoint, Riser, RiserCurve } from './riser';
export { adiabaticAirWatts, choosePumps, isothermalAirWatts, pumpFlowLpm } from './air-pump';
export type { PumpSelection } from './air-pump';
export { TYPICAL_AIR_PUMPS } from './typical-air-pumps';
export { aeration } from './aeration';
export type { AerationInput, AerationResult } from './aeration';
export {
	DIFFUSER_TRANSFER_PERCENT_PER_M,
	FISH_KG_O2_PER_KG_FEED,
	fieldToStandardRatio,
	OXYGEN_G_PER_M3_STANDARD_AIR,
	oxygenDemandGramsPerHour,
	oxygenFromAir
} from './oxygen-transfer';
export type { FieldConditions, OxygenDemand } from './oxygen-transfer';
export { DEFAULT_TARGET_DO_MG_L, designConditions } from './design-conditions';
export type { DesignConditions } from './design-conditions';
export { designAir } from './air-design';
export type { AirDesignResult, DesignedAirlift } from './air-design';
export { scenarioDelivery } from './delivery';
export type { Delivery, DeliveryDevice } from './delivery';
export { EMPTY_SITE_WATER, siteWaterSchema, tankSchema, WATER_KINDS } from './site-water.schema';
export type { SiteWater, SiteWaterInput, Tank, TankInput } from './site-water.schema';
export {
	barometricPressureAtm,
	oxygenSaturationMgL,
	SALINITY_G_PER_KG,
	STANDARD_ATMOSPHERE_PA,
	waterDensityKgPerM3,
	waterVapourPressureAtm,
	waterViscosityPaS
} from './water';
export { REFERENCE_WATTS, referenceMonthlyCost } from './reference';
export { DUTY_OF, redundancy } from './redundancy';
export type { Duty, DutyRedundancy } from './redundancy';

// What the app's pages, charts, forms, exports and scripts read from the core besides the three
// calculations: clock and calendar building blocks, meters, field schemas, units and month names.
export { tieredAmount } from './bill';
export { buildCalendar } from './calendar';
export {
	daysMatch,
	INTERVAL_HOURS,
	INTERVAL_MINUTES,
	nominalWindowMinutes,
	slotMask,
	SLOTS_PER_DAY
} from './clock';
export type { DaySelector } from './clock';
export { STANDARD_DAY } from './day-shapes';
export { DemandMeter } from './demand';
export { UsageMeter } from './energy';
export { amount, list } from './fields';
export type { Bounds } from './fields';
export type { HolidaySpec } from './holidays';
export { groupLoads, ProfileBook } from './loads';
export { MONTH_ABBREVIATIONS, MONTH_NAMES } from './months';
export { billingSpans } from './periods';
export { RateBook } from './rates';
export { dayProfile } from './schedule';
export { NUL_MESSAGE, storableText, SURROGATE_MESSAGE, UNSTORABLE, unstorableMessage } from './storable-text';
export { METERS_PER_FOOT, STANDARD_GRAVITY_M_PER_S2 } from './units';
export { urdbRateSchema } from './urdb.schema';
export type { UrdbRate } from './urdb.schema';
export { tariffFromUrdb, urdbDate } from './urdb-import';
export type { ImportNote, UrdbImport } from './urdb-import';
export { urdbFromTariff } from './urdb-export';
export type { ExportNote, UrdbExport, UrdbMeta } from './urdb-export';
export { hasTouTiers } from './rate-columns';
