/**
 * The photometry core's stable API: SI units (m, cd, lm, lx), angles in degrees at this edge.
 * The UI, the command-line report and outside verification all call these names.
 */
export * from './beam';
export * from './flux';
export * from './spread';
export * from './pointSource';
export * from './areaSource';
export * from './dimming';
export * from './colour';
export * from './exposure';
export * from './cylindrical';
export { simpson, gaussLegendre, compositeGauss } from './quadrature';
