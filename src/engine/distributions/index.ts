export { normalQuantile, normalTwoSidedP, normalUpperTail } from './normal';
export { studentTQuantile, studentTTwoSidedP, studentTUpperTail } from './studentT';
export { fisherFQuantile, fisherFUpperTail } from './fisherF';
