// End-to-end suite: playwright-core driving Debian's Chromium against a running server (E2E_BASE_URL).
module.exports = {
  displayName: 'e2e',
  testEnvironment: 'node',
  transform: { '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.jest.json', diagnostics: false }] },
  testMatch: ['<rootDir>/tests/e2e/**/*.e2e.ts'],
  testTimeout: 120000,
};
