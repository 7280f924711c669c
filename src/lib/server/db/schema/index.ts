export * from './auth';
export * from './workspace';
export * from './tariff';
export * from './site';
export * from './bill';
export * from './shared-state';
