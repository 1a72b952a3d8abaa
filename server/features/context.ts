/** What every feature's routes are built from: the app's dependencies plus the shared layers. */
import type { AppDeps } from '../app.ts';
import type { Auth } from '../auth/index.ts';
import type { Models } from '../db/models/index.ts';
import type { Mailer } from './mail/mailer.ts';

export interface FeatureDeps extends AppDeps {
  models: Models;
  auth: Auth;
  mailer: Mailer;
  /** Where e-mailed links point, e.g. `http://127.0.0.1:5180`. */
  publicUrl: string;
}
