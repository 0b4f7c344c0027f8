export * from './fixtures';
export * from './positions';
export * from './people';
export * from './show';
export * from './looks';
export * from './power';
export * from './replace';
