export * from './primitives';
export * from './stage';
export * from './fixtureType';
export * from './fixture';
export * from './people';
export * from './document';
export * from './power';
export * from './looks';
