// The fit engine: which tracks suit which dance, and slower music for a lesson. Pure TypeScript.
export * from './settings';
export * from './figures';
export * from './phrasing';
export * from './tempo-fit';
export * from './meter-fit';
export * from './reasons';
export * from './fit-reasons';
export * from './fit-score';
export * from './rank';
export * from './lesson-tempo';
