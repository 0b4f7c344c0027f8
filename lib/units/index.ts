export * from './length';
export * from './illuminance';
export * from './stops';
