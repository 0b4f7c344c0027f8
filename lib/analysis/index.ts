export * from './rig';
export * from './fixtureLight';
export * from './measuredSource';
export * from './fixtureFocus';
export * from './subjectLight';
export * from './pointLight';
export * from './subjectLighting';
export * from './coverage';
