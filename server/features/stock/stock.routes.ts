/**
 * `/api/workshops/:workshopId/stock`: members read it with its version; owners and designers
 * replace it whole, naming the version they edited (a moved version is a 409 and saves nothing).
 */
import { stockBody } from '../../../shared/schemas/stock.ts';
import { workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { handle } from '../../http/handle.ts';
import type { FeatureDeps } from '../context.ts';
import { createStockService } from './stock.service.ts';

export function stockRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createStockService(deps.sequelize);
  return [
    {
      method: 'get',
      path: '/workshops/:workshopId/stock',
      access: { kind: 'member', action: 'workshop.read', scope: 'workshop' },
      handler: handle({ params: workshopIdParams }, ({ params }) => service.get(params.workshopId)),
    },
    {
      method: 'put',
      path: '/workshops/:workshopId/stock',
      access: { kind: 'member', action: 'stock.manage', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, body: stockBody }, ({ params, body, userId }) => service.replace(params.workshopId, body.stock, body.version, userId)),
    },
  ];
}
