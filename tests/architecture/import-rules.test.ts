// The folder import rules (DEVELOPERS.md "Architecture") are live: ESLint rejects a wrong arrow.
import { lintCases } from './lint-cases';

const lintAll = (cases: [string, string][]) => lintCases('no-restricted-imports', cases);

const FORBIDDEN: [string, string][] = [
  ['planner/model/x.ts', "import pg from 'pg';\nexport const a = pg;\n"],
  ['planner/model/x.ts', "import fs from 'node:fs';\nexport const a = fs;\n"],
  ['planner/model/x.ts', "import { createDb } from '../../db/client';\nexport const a = createDb;\n"],
  ['planner/remap/x.ts', "import { buildScenario } from '../../scenarios/generate/scenario-builder';\nexport const a = buildScenario;\n"],
  ['planner/cli/x.ts', "import { buildScenario } from '../../scenarios/generate/scenario-builder';\nexport const a = buildScenario;\n"],
  ['shared/x.ts', "import express from 'express';\nexport const a = express;\n"],
  ['db/x.ts', "import { planWindow } from '../planner/remap/plan-window';\nexport const a = planWindow;\n"],
  ['app/x.tsx', "import { createDb } from '@/db/client';\nexport const a = createDb;\n"],
  ['components/x.tsx', "import { createApp } from '@/server/app';\nexport const a = createApp;\n"],
  // Layers inside server/: SQL only in queries/, services take ports, queries know nothing above them.
  ['server/services/windows/x.ts', "import { eq } from 'drizzle-orm';\nexport const a = eq;\n"],
  ['server/services/windows/x.ts', "import { windows } from '../../../db/schema';\nexport const a = windows;\n"],
  ['server/routes/x.ts', "import { sql } from 'drizzle-orm';\nexport const a = sql;\n"],
  ['server/jobs/x.ts', "import { plans } from '../../db/schema/plans';\nexport const a = plans;\n"],
  ['server/services/windows/x.ts', "import express from 'express';\nexport const a = express;\n"],
  ['server/services/signoff/x.ts', "import type { RouteDeps } from '../../routes/deps';\nexport type D = RouteDeps;\n"],
  ['server/services/plans/x.ts', "import type { JobQueue } from '../../jobs/queue';\nexport type Q = JobQueue;\n"],
  ['server/services/x.ts', "import { mopUpload } from '../http/mop-upload';\nexport const a = mopUpload;\n"],
  ['server/queries/windows/x.ts', "import { loadWindow } from '../../services/windows/window-view';\nexport const a = loadWindow;\n"],
  ['server/queries/plans/x.ts', "import { currentUser } from '../../auth/guards';\nexport const a = currentUser;\n"],
];
const ALLOWED: [string, string][] = [
  ['planner/model/x.ts', "import Graph from 'graphology';\nimport type { Scenario } from '../../shared/scenario';\nexport type S = Scenario;\nexport const g = Graph;\n"],
  ['planner/workers/x.ts', "import { Worker } from 'node:worker_threads';\nexport const w = Worker;\n"],
  ['shared/x.ts', "import { z } from 'zod';\nimport { scenarioSchema } from './scenario';\nexport const a = [z, scenarioSchema];\n"],
  ['server/x.ts', "import { createDb } from '../db/client';\nexport const a = createDb;\n"],
  ['server/queries/windows/x.ts', "import { eq } from 'drizzle-orm';\nimport { windows } from '../../../db/schema';\nexport const a = [eq, windows];\n"],
  ['server/routes/x.ts', "import express from 'express';\nimport { loadWindow } from '../services/windows/window-view';\nexport const a = [express, loadWindow];\n"],
  ['server/services/plans/x.ts', "import type { PlanQueue } from '../ports';\nimport type { Tx } from '../../../db/client';\nexport type P = [PlanQueue, Tx];\n"],
  ['server/queries/notices/x.ts', "import { getUsersByIds } from '../auth/users';\nexport const a = getUsersByIds;\n"],
];

describe('folder import rules', () => {
  let results: string[][];
  beforeAll(() => {
    results = lintAll([...FORBIDDEN, ...ALLOWED]);
  }, 60000);

  test.each(FORBIDDEN.map((c, i) => [c[0], c[1].split('\n')[0], i] as const))('%s rejects: %s', (_f, _c, i) => {
    expect(results[i]).not.toHaveLength(0);
  });
  test.each(ALLOWED.map((c, i) => [c[0], c[1].split('\n')[0], FORBIDDEN.length + i] as const))('%s allows: %s', (_f, _c, i) => {
    expect(results[i]).toEqual([]);
  });
});
