export { checkStep } from './check-step';
export { clearTransformationCache, transformation, type Transformation } from './transformation';
export * from './types';
