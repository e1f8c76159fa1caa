import type { Router } from 'express';
import type { AppContext } from '../context';
import type { HookSteps } from './hooks';

/** Timed work a feature runs on the scheduler's beat; answers how many rows it handled. */
export interface Job {
  name: string;
  run(ctx: AppContext): Promise<number | void>;
}

/**
 * What a feature brings to the app: its routers, the hook steps it adds to other features' use cases, and its
 * scheduled jobs. `server/src/features.ts` lists them; nothing else imports a feature.
 */
export interface Feature {
  name: string;
  /** Answered before the session middleware, so a public read creates no session. */
  publicRoutes?: (ctx: AppContext) => Router;
  routes?: (ctx: AppContext) => Router;
  hooks?: Partial<HookSteps>;
  jobs?: Job[];
}
