import type { Auth } from './http/route';

declare module 'express-serve-static-core' {
  interface Request {
    auth?: Auth | null;
  }
}

declare module 'express-session' {
  interface SessionData {
    workspaceId?: string;
  }
}

export {};
