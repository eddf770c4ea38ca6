// What every router needs: the data source, the session service and the app's public origin.
import type { DataSource } from 'typeorm';
import type { Auth } from './auth/lucia';
import type { SignInLimiter } from './auth/rate-limit';

export interface AppContext {
  ds: DataSource;
  auth: Auth;
  publicOrigin?: string;
  signInLimiter: SignInLimiter;
}
