// POST /api/scenarios/validate (admin, planner): the body is a scenario file; always 200 with every issue and its JSON path.
import express, { type Router } from 'express';
import { scenarioValidationSchema } from '../../shared/api';
import { INVENTORY_IMPORT_ROLES } from '../../shared/permissions';
import { validateScenario } from '../../shared/scenario-validate';
import { requireRole } from '../auth/guards';

export function scenariosRouter(): Router {
  const router = express.Router();
  router.post('/validate', requireRole(...INVENTORY_IMPORT_ROLES), (req, res) => {
    const result = validateScenario(req.body);
    const errors = result.ok ? [] : result.errors;
    res.json(scenarioValidationSchema.parse({ ok: result.ok, errors, warnings: result.warnings }));
  });
  return router;
}
