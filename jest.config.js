// Three jest projects: pure planner/shared code and the scenario generators, server + db against PostgreSQL,
// and the app under jest-expo.
// The end-to-end suite (tests/e2e) runs separately from scripts/test.sh once the server is up.
const tsJest = {
  '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.jest.json', diagnostics: false }],
};
const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1', '^(\\.{1,2}/.*)\\.js$': '$1' };

module.exports = {
  // Generous: CI shares two cores between jest workers, PostgreSQL and worker threads; speed is
  // measured by the benchmark, never by test time-outs.
  testTimeout: 60000,
  projects: [
    {
      displayName: 'planner',
      testEnvironment: 'node',
      transform: tsJest,
      moduleNameMapper,
      testMatch: ['<rootDir>/tests/planner/**/*.test.ts', '<rootDir>/tests/scenarios/**/*.test.ts', '<rootDir>/tests/shared/**/*.test.ts', '<rootDir>/tests/architecture/**/*.test.ts'],
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      // @oslojs/* and arctic ship only ES modules; ts-jest (allowJs) turns them into CommonJS for jest.
      transform: { ...tsJest, '^.+/node_modules/(@oslojs|arctic)/.+\\.js$': ['ts-jest', { tsconfig: { allowJs: true }, diagnostics: false }] },
      transformIgnorePatterns: ['/node_modules/(?!(@oslojs|arctic)/)'],
      moduleNameMapper,
      testMatch: ['<rootDir>/tests/server/**/*.test.ts', '<rootDir>/tests/db/**/*.test.ts'],
    },
    {
      displayName: 'app',
      // WARNING: the native preset on purpose. Under 'jest-expo/web' with RN 0.85, @react-native/jest-preset's
      // '^react-native($|/.*)' mapper wins over the web alias (native modules then throw), and with the alias
      // forced, react-native-web's DOM host elements hide testID/onChangeText from Testing Library.
      preset: 'jest-expo',
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/$1' },
      testMatch: ['<rootDir>/tests/app/**/*.test.tsx'],
      // gifted-charts-core and standard-navigation (under expo-router's Link) ship ES modules only (react-native-gifted-charts is already covered by react-native.*).
      transformIgnorePatterns: [
        'node_modules/(?!((jest-)?react-native|@react-native(-community)?)|expo(nent)?|@expo(nent)?/.*|@expo-google-fonts/.*|react-navigation|@react-navigation/.*|react-native-svg|@tanstack/.*|gifted-charts-core|standard-navigation)',
      ],
    },
  ],
};
