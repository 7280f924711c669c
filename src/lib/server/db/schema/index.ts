export * from './auth';
export * from './workspace';
export * from './tariff';
