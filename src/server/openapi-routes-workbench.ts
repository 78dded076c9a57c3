import type { RouteDoc } from './openapi-types';

export const workbenchRoutes: RouteDoc[] = [];
