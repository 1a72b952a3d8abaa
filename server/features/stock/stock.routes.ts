/** `/api/workshops/:workshopId/stock`: members read it; owners and designers replace it whole. */
import { stockBody } from '../../../shared/schemas/stock.ts';
import { workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { currentUser } from '../../auth/user.ts';
import type { FeatureDeps } from '../context.ts';
import { createStockService } from './stock.service.ts';

export function stockRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createStockService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/workshops/:workshopId/stock',
      access: { kind: 'member', action: 'workshop.read', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        res.json(await service.get(workshopId));
      },
    },
    {
      method: 'put',
      path: '/workshops/:workshopId/stock',
      access: { kind: 'member', action: 'stock.manage', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        const stock = stockBody.parse(req.body);
        res.json(await service.replace(workshopId, stock, currentUser(req).id));
      },
    },
  ];
}
