// Public surface of the engine. Re-exports only; every algorithm lives in its own module.

export * from './errors';
export * from './money/minor';
export * from './network/types';
export * from './network/build';
export * from './routes/label-correcting';
export * from './routes/cheapest-routes';
export * from './routes/route-path';
export * from './routes/leg-limited';
export * from './loops/rebate-loop';
export * from './loops/strong-components';
export * from './loops/find-negative-loop';
export * from './report/routes-report';
