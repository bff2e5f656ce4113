/** Every route of the service, in the order the OpenAPI document and the API page list them. */
import { COMPUTE_ROUTES } from './compute.js';
import { HULL_ROUTES } from './hulls.js';
import { PAGE_ROUTES } from './page.js';
import { PLOT_ROUTES } from './plots.js';
import { REPORT_ROUTES } from './report.js';
import type { RouteSpec } from './routeSpec.js';
import { SERVICE_ROUTES } from './service.js';
import { VALUE_ROUTES } from './value.js';

export const ALL_ROUTES: readonly RouteSpec[] = [...COMPUTE_ROUTES, ...VALUE_ROUTES, ...PLOT_ROUTES, ...REPORT_ROUTES, ...HULL_ROUTES, ...SERVICE_ROUTES, ...PAGE_ROUTES];
