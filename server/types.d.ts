import type { Role } from '../shared/schemas/users';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
  }
}

declare global {
  namespace Express {
    interface Request {
      /** The signed-in, active person, loaded afresh on every request. */
      user?: { id: number; email: string; name: string; role: Role };
    }
  }
}

export {};
