import type { PassportStatic } from 'passport';
import type { RouteDef } from './http/route';
import { authRoutes } from './auth/routes';
import { memberRoutes } from './members/routes';
import { tokenRoutes } from './tokens/routes';
import { auditRoutes } from './audit/routes';
import { partRoutes } from './parts/routes';
import { fileRoutes } from './files/routes';
import { supplierRoutes } from './suppliers/routes';
import { quoteRoutes } from './quotes/routes';
import { fxRoutes } from './fx/routes';
import { profileRoutes } from './profiles/routes';
import { bomRoutes } from './boms/routes';
import { stressRoutes } from './stress/routes';
import { toolRoutes } from './tools/routes';
import { billingRoutes } from './billing/routes';
import { rfqRoutes } from './rfqs/routes';
import { exportRoutes } from './export/routes';

/**
 * The route table: every API route with its access rule and schemas, in one list.
 * The router, the OpenAPI document and the role-matrix test are all read from it.
 */
export function routeTable(passport: PassportStatic): RouteDef[] {
  return [
    ...authRoutes(passport),
    ...memberRoutes,
    ...tokenRoutes,
    ...auditRoutes,
    ...partRoutes,
    ...fileRoutes,
    ...supplierRoutes,
    ...quoteRoutes,
    ...fxRoutes,
    ...profileRoutes,
    ...bomRoutes,
    ...stressRoutes,
    ...toolRoutes,
    ...billingRoutes,
    ...rfqRoutes,
    ...exportRoutes,
  ];
}
