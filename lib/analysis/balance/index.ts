export * from './boundedLeastSquares';
export * from './advice';
export * from './balance';
