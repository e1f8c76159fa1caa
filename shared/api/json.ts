/**
 * A response type as the client receives it: JSON turns every `Date` the server returns into its ISO string.
 * The server's services are typed with the plain response types in `shared/api/`; the client reads `Json<T>`.
 */
export type Json<T> = T extends Date
  ? string
  : T extends (infer U)[]
    ? Json<U>[]
    : T extends readonly (infer U)[]
      ? readonly Json<U>[]
      : T extends object
        ? { [K in keyof T]: Json<T[K]> }
        : T;
