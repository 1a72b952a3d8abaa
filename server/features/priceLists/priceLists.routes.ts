/** `/api/workshops/:workshopId/price-list`: members read it; the owner replaces it from JSON or CSV. */
import express from 'express';
import { priceListBody, priceListCsvQuery } from '../../../shared/schemas/priceLists.ts';
import { workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { currentUser } from '../../auth/user.ts';
import { handle } from '../../http/handle.ts';
import { HttpError } from '../../http/HttpError.ts';
import type { FeatureDeps } from '../context.ts';
import { createPriceListService } from './priceLists.service.ts';

/** Largest CSV accepted: 5000 rows of about 80 characters, with room to spare. */
export const CSV_BODY_LIMIT = '1mb';

const csvText = express.text({ type: ['text/csv', 'text/plain'], limit: CSV_BODY_LIMIT });

export function priceListRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createPriceListService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/workshops/:workshopId/price-list',
      access: { kind: 'member', action: 'workshop.read', scope: 'workshop' },
      handler: handle({ params: workshopIdParams }, ({ params }) => service.get(params.workshopId)),
    },
    {
      method: 'put',
      path: '/workshops/:workshopId/price-list',
      access: { kind: 'member', action: 'priceList.manage', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, body: priceListBody }, ({ params, body, userId }) => service.replace(params.workshopId, body, userId)),
    },
    {
      method: 'post',
      path: '/workshops/:workshopId/price-list/csv',
      access: { kind: 'member', action: 'priceList.manage', scope: 'workshop' },
      before: [csvText],
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        const { currency } = priceListCsvQuery.parse(req.query);
        if (typeof req.body !== 'string') {
          throw new HttpError(415, 'unsupported_media_type', 'Send the price list as the request body with Content-Type: text/csv.');
        }
        res.json(await service.replaceFromCsv(workshopId, req.body, currency, currentUser(req).id));
      },
    },
  ];
}
