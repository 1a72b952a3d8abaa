/**
 * The demo workshop's stock. Every board, offcut and defect here is INVENTED for the demo — a
 * plausible small shop's rack, not anyone's inventory — so the Materials page shows boards on
 * hand used first and cut around their knots and checks. Seeded only when the workshop has no
 * stock saved, so an owner's or designer's edits are never overwritten.
 */
import type { Sequelize } from 'sequelize';
import { DEFAULT_STOCK_SETTINGS, type StockSettings } from '../../shared/materials/stockSettings.ts';
import { stockSettingsSchema } from '../../shared/schemas/stock.ts';
import { modelsFor } from './models/index.ts';

const IN = 25.4;
const FT = 12 * IN;

/** The invented stock: the usual sheets, 6 to 10 ft boards, one plywood offcut, five boards on the rack. */
export const DEMO_STOCK: StockSettings = stockSettingsSchema.parse({
  ...DEFAULT_STOCK_SETTINGS,
  offcuts: [{ sheetId: 'hardwood-plywood-3/4', lengthMm: 48 * IN, widthMm: 30 * IN, count: 1 }],
  boardLengthsMm: [6 * FT, 8 * FT, 10 * FT],
  boardWidthsMm: [4 * IN, 6 * IN, 8 * IN],
  boardsInStock: [
    {
      label: 'WO-1', speciesId: 'white-oak', quarters: 4, lengthMm: 8 * FT, widthMm: 7.5 * IN,
      defects: [{ kind: 'knot', fromEndMm: 38 * IN, fromEdgeMm: 2.5 * IN, lengthMm: 1.25 * IN, widthMm: 1.25 * IN }],
    },
    {
      label: 'WO-2', speciesId: 'white-oak', quarters: 4, lengthMm: 6 * FT, widthMm: 6.25 * IN,
      defects: [{ kind: 'check', fromEndMm: 0, fromEdgeMm: 2.75 * IN, lengthMm: 5 * IN, widthMm: 0.25 * IN }],
    },
    { label: 'WO-3', speciesId: 'white-oak', quarters: 8, lengthMm: 5 * FT, widthMm: 5 * IN, defects: [] },
    {
      label: 'CH-1', speciesId: 'black-cherry', quarters: 4, lengthMm: 7 * FT, widthMm: 9 * IN,
      defects: [
        { kind: 'knot', fromEndMm: 20 * IN, fromEdgeMm: 6 * IN, lengthMm: 1 * IN, widthMm: 1 * IN },
        { kind: 'other', fromEndMm: 60 * IN, fromEdgeMm: 0, lengthMm: 8 * IN, widthMm: 1.5 * IN },
      ],
    },
    { label: 'SM-1', speciesId: 'soft-maple', quarters: 4, lengthMm: 8 * FT, widthMm: 6 * IN, defects: [] },
  ],
});

/** Gives `workshopId` the demo stock unless it has stock saved; returns true when it saved it. */
export async function seedDemoStock(sequelize: Sequelize, workshopId: string, ownerId: string): Promise<boolean> {
  const [, created] = await modelsFor(sequelize).WorkshopStock.findOrCreate({
    where: { workshopId },
    defaults: { workshopId, stock: DEMO_STOCK, updatedBy: ownerId },
  });
  return created;
}
