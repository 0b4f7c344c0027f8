export * from './schedule';
export * from './focusChart';
export * from './stageSide';
export * from './csvSheets';
