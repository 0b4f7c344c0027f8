export * from './genericTypes';
export * from './measuredType';
