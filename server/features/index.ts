import type { Router } from 'express';
import type { AppDeps } from '../app.ts';

/** A feature mounts its routes on the `/api` router; `app.ts` mounts them in this order. */
export type MountFeature = (api: Router, deps: AppDeps) => void;

export const apiFeatures: MountFeature[] = [];
