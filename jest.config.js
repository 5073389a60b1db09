/** Jest: TypeScript through ts-jest; tests mirror src/ under test/. */
module.exports = {
  testEnvironment: 'node',
  roots: ['<rootDir>/test'],
  transform: { '^.+\\.tsx?$': ['ts-jest', { tsconfig: 'tsconfig.json', diagnostics: false }] },
  testMatch: ['**/*.test.ts'],
};
