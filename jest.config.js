/** Jest: TypeScript through ts-jest; every suite under test/. */
module.exports = {
  testEnvironment: "node",
  roots: ["<rootDir>/test"],
  testMatch: ["**/*.test.ts"],
  transform: { "^.+\\.tsx?$": ["ts-jest", { tsconfig: "tsconfig.json", diagnostics: { warnOnly: false } }] },
  moduleNameMapper: {
    "^office-addin-manifest$": "<rootDir>/node_modules/office-addin-manifest/lib/officeApp.js",
  },
  testTimeout: 120000,
  reporters: ["default", "<rootDir>/test/support/summaryReporter.js"],
};
