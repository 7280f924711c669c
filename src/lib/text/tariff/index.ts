/**
 * The tariff in plain words, for the tariff page, its version history, its charts and the exported
 * workbook: one place to import them from, so a rate reads the same everywhere.
 */
export * from './rate-phrases';
export * from './charge-sentences';
export * from './tou-sentences';
export * from './demand-sentences';
export { minimumLines } from './minimum-sentences';
export { type TariffSection, describeTariff } from './tariff-summary';
export { describeTariffDiff } from './version-diff';
export { referenceBasisText, versionInForceText } from './reference-basis';
export { beforeFirstVersionNote, periodsText } from './version-notes';
