import type { Request, Response, NextFunction } from 'express';
import type { PassportStatic } from 'passport';

import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import {
  signupBody, loginBody, switchBody, resetRequestBody, resetConfirmBody, sessionOut,
} from '../../src/shared/schemas/auth';
import { usersRepo } from './repository';
import { signup, loginSession, sessionView, defaultWorkspace, requestReset, confirmReset } from './service';

function authenticate(passport: PassportStatic, req: Request, res: Response): Promise<{ id: string } | false> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', (err: unknown, user: { id: string } | false) => (err ? reject(err) : resolve(user)))(
      req, res, ((e: unknown) => e && reject(e)) as NextFunction,
    );
  });
}

export function authRoutes(passport: PassportStatic): RouteDef[] {
  return [
    route({
      method: 'post', path: '/api/auth/signup', access: 'public', tag: 'Auth', rateLimit: 'auth', status: 201,
      summary: 'Create an account and a workspace owned by it; signs in.',
      body: signupBody, response: sessionOut,
      handler: async ({ req, body, deps }) => {
        const { userId, workspaceId } = await signup(deps, body);
        await loginSession(req, userId, workspaceId);
        return sessionView(deps, userId, workspaceId);
      },
    }),
    route({
      method: 'post', path: '/api/auth/login', access: 'public', tag: 'Auth', rateLimit: 'auth',
      summary: 'Sign in with e-mail and password; sets the session cookie.',
      body: loginBody, response: sessionOut,
      handler: async ({ req, res, deps }) => {
        const user = await authenticate(passport, req, res);
        if (!user) throw errors.unauthenticated('E-mail or password is wrong.');
        const workspaceId = await defaultWorkspace(deps, user.id);
        await loginSession(req, user.id, workspaceId);
        return sessionView(deps, user.id, workspaceId);
      },
    }),
    route({
      method: 'post', path: '/api/auth/logout', access: 'public', tag: 'Auth',
      summary: 'Sign out: the session is destroyed on the server.',
      handler: async ({ req, res }) => {
        if (!req.session) return undefined;
        await new Promise<void>((resolve, reject) => req.logout((e) => (e ? reject(e) : resolve())));
        await new Promise<void>((resolve, reject) => req.session.destroy((e) => (e ? reject(e) : resolve())));
        res.clearCookie('farthing.sid');
        return undefined;
      },
    }),
    route({
      method: 'get', path: '/api/auth/me', access: 'signedIn', tag: 'Auth',
      summary: 'The signed-in user, the current workspace and role, and every workspace of the user.',
      response: sessionOut,
      handler: async ({ auth, deps }) => {
        const view = await sessionView(deps, auth.userId, auth.workspaceId);
        const ms = await usersRepo.memberships(deps.db, auth.userId);
        return { ...view, workspaces: ms.map((m) => ({ id: m.workspaceId, name: m.workspaceName, role: m.role })) };
      },
    }),
    route({
      method: 'post', path: '/api/auth/switch', access: 'signedIn', tag: 'Auth',
      summary: 'Switch the session to another workspace the user belongs to.',
      body: switchBody, response: sessionOut,
      handler: async ({ req, body, auth, deps }) => {
        if (auth.via === 'token') throw errors.forbidden('An API token is bound to one workspace.');
        const m = await usersRepo.membership(deps.db, auth.userId, body.workspaceId);
        if (!m) throw errors.notFound('workspace');
        req.session.workspaceId = m.workspaceId;
        return sessionView(deps, auth.userId, m.workspaceId);
      },
    }),
    route({
      method: 'post', path: '/api/auth/password-reset', access: 'public', tag: 'Auth', rateLimit: 'auth', status: 202,
      summary: 'Send a password-reset link by e-mail (the answer is the same whether or not the address has an account).',
      body: resetRequestBody,
      handler: async ({ body, deps }) => {
        await requestReset(deps, body.email);
        return { accepted: true };
      },
    }),
    route({
      method: 'post', path: '/api/auth/password-reset/confirm', access: 'public', tag: 'Auth', rateLimit: 'auth',
      summary: 'Set a new password with a reset token; every session of the user is signed out.',
      body: resetConfirmBody,
      handler: async ({ body, deps }) => {
        await confirmReset(deps, body.token, body.password);
        return undefined;
      },
    }),
  ];
}

