export * from './common';
export * from './auth';
export * from './shop';
export * from './team';
export * from './pieces';
export * from './audit';
export * from './health';
