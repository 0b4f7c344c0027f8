export * from './grid';
export * from './profileTable';
export * from './kernel';
export * from './engine';
export * from './statistics';
export * from './regions';
export * from './isolux';
export * from './service';
