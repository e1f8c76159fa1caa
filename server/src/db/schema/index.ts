export * from './users';
export * from './groups';
export * from './platform';
export * from './categories';
export * from './events';
export * from './volunteers';
export * from './event-day';
export * from './impact';
