import type { Request, Response } from 'express';
import type { z } from 'zod';
import type { Action } from '../../src/shared/permissions';
import type { Role } from '../../src/shared/schemas/common';
import type { Deps } from '../deps';
import type { UploadedFile } from './upload';

/** Who is asking: a signed-in user acting in one workspace with one role. */
export interface Auth {
  userId: string;
  workspaceId: string;
  role: Role;
  via: 'session' | 'token';
  tokenId?: string;
}

/**
 * `public`: anyone; `signedIn`: any member of the current workspace; otherwise the
 * permission (see src/shared/permissions.ts) the caller's role must have.
 */
export type Access = 'public' | 'signedIn' | Action;

type AnySchema = z.ZodType;
type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteContext<B, P, Q, A> {
  req: Request;
  res: Response;
  body: B;
  params: P;
  query: Q;
  auth: A;
  deps: Deps;
  /** Multipart routes: the one uploaded file and the other form fields. */
  upload: { file: UploadedFile; fields: Record<string, string> };
}

export interface RouteDef<
  B extends AnySchema | undefined = AnySchema | undefined,
  P extends AnySchema | undefined = AnySchema | undefined,
  Q extends AnySchema | undefined = AnySchema | undefined,
  Acc extends Access = Access,
> {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  access: Acc;
  tag: string;
  summary: string;
  body?: B;
  params?: P;
  query?: Q;
  /** Response body schema, for the API document. */
  response?: AnySchema;
  status?: number;
  rateLimit?: 'auth';
  /** Routes that read the raw body or a multipart upload set this; JSON parsing is skipped. */
  bodyKind?: 'json' | 'multipart' | 'raw';
  /** For multipart routes: the largest file accepted (413 above it). */
  maxUploadBytes?: number;
  handler: (
    ctx: RouteContext<Out<B>, Out<P>, Out<Q>, Acc extends 'public' ? Auth | null : Auth>,
  ) => Promise<unknown>;
}

/** Declares a route with its schemas and access rule; the handler receives parsed input. */
export function route<
  B extends AnySchema | undefined = undefined,
  P extends AnySchema | undefined = undefined,
  Q extends AnySchema | undefined = undefined,
  Acc extends Access = Access,
>(def: RouteDef<B, P, Q, Acc>): RouteDef {
  return def as unknown as RouteDef;
}
