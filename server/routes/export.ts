// GET /api/export/scenario and /api/export/graphml (planner, admin, engineer): the current inventory as files.
import express, { type Response, type Router } from 'express';
import { INVENTORY_EXPORT_ROLES } from '../../shared/permissions';
import { formatIssue, validateScenario } from '../../shared/scenario-validate';
import { requireRole } from '../auth/guards';
import { ExportInvalidError } from '../services/inventory/errors';
import { scenarioToGraphml } from '../services/inventory/graphml-export';
import { loadNetworkScenario } from '../services/inventory/load-network-scenario';
import type { RouteDeps } from './deps';

function attachment(res: Response, fileName: string, contentType: string): void {
  res.setHeader('Content-Type', contentType);
  res.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
}

export function exportRouter({ db, now }: RouteDeps): Router {
  const router = express.Router();
  const stamp = () => now().toISOString().slice(0, 10);
  router.get('/scenario', requireRole(...INVENTORY_EXPORT_ROLES), async (_req, res) => {
    const result = validateScenario(await loadNetworkScenario(db));
    // Refuse to hand out a file our own import would reject.
    if (!result.ok) throw new ExportInvalidError(formatIssue(result.errors[0]));
    attachment(res, `slackwater-scenario-${stamp()}.json`, 'application/json; charset=utf-8');
    res.send(JSON.stringify(result.scenario, null, 2));
  });
  router.get('/graphml', requireRole(...INVENTORY_EXPORT_ROLES), async (_req, res) => {
    attachment(res, `slackwater-network-${stamp()}.graphml`, 'application/graphml+xml; charset=utf-8');
    res.send(scenarioToGraphml(await loadNetworkScenario(db)));
  });
  return router;
}
