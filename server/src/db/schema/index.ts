export * from './users';
export * from './groups';
export * from './platform';
