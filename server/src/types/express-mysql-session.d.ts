declare module 'express-mysql-session' {
  const factory: (session: unknown) => new (options: object, connection?: unknown) => import('express-session').Store;
  export default factory;
}
