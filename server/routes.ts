import type { PassportStatic } from 'passport';
import type { RouteDef } from './http/route';
import { authRoutes } from './auth/routes';
import { memberRoutes } from './members/routes';
import { tokenRoutes } from './tokens/routes';
import { auditRoutes } from './audit/routes';

/**
 * The route table: every API route with its access rule and schemas, in one list.
 * The router, the OpenAPI document and the role-matrix test are all read from it.
 */
export function routeTable(passport: PassportStatic): RouteDef[] {
  return [...authRoutes(passport), ...memberRoutes, ...tokenRoutes, ...auditRoutes];
}
