export * from './vector';
export * from './aim';
export * from './coneSection';
export * from './footprint';
