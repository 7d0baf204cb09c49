// GET /api/export/scenario and /api/export/graphml (planner, admin, engineer): the current inventory as files,
// streamed to the response a piece at a time (see services/inventory/stream-export.ts).
import express, { type Response, type Router } from 'express';
import { INVENTORY_EXPORT_ROLES } from '../../shared/permissions';
import { requireRole } from '../auth/guards';
import { graphmlPieces, loadGraphmlNetwork } from '../services/inventory/graphml-export';
import { currentInventory } from '../services/inventory/inventory-cache';
import { assertExportable, scenarioJsonPieces, streamPieces } from '../services/inventory/stream-export';
import type { RouteDeps } from './deps';

function attachment(res: Response, fileName: string, contentType: string): void {
  res.setHeader('Content-Type', contentType);
  res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
}

export function exportRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  const stamp = () => now().toISOString().slice(0, 10);
  router.get('/scenario', requireRole(...INVENTORY_EXPORT_ROLES), async (_req, res) => {
    // The process's compiled copy of the current revision: no eight-table read before the first byte.
    const { scenario } = await currentInventory(db);
    // Refuse to hand out a file our own import would reject (before any byte is sent).
    assertExportable(scenario);
    attachment(res, `slackwater-scenario-${stamp()}.json`, 'application/json; charset=utf-8');
    await streamPieces(res, scenarioJsonPieces(scenario));
  });
  router.get('/graphml', requireRole(...INVENTORY_EXPORT_ROLES), async (_req, res) => {
    const network = await loadGraphmlNetwork(db);
    attachment(res, `slackwater-network-${stamp()}.graphml`, 'application/graphml+xml; charset=utf-8');
    await streamPieces(res, graphmlPieces(network));
  });
  return router;
}
