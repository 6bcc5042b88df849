/** Comparing revisions of a sheet (pure, client-safe). */
export * from './diff';
export * from './format';
