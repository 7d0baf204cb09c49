// Demo seeding: re-exports only.
export { seedDemo, parseScenarioOrThrow, ScenarioInvalidError, type SeedSummary } from './seed-demo';
export { DEMO_USERS, DEMO_PASSWORD, pickDemoTenantId, type DemoUser } from './demo-users';
export { windowShiftMs, shiftedWindowTimes } from './shift-windows';
