// The import rules of the house, checked by dependency-cruiser (tests/unit/architecture.test.ts).
// Paths are from the repository's root. Each rule names why it exists; a new exception needs a
// reason as good, written here.
/** @type {import('dependency-cruiser').IForbiddenRuleType[]} */
const forbidden = [
  {
    name: "app-stands-alone",
    comment:
      "The product never depends on its demo data or its tests: seeds/ and tests/ import app/, not the reverse.",
    severity: "error",
    from: { path: "^app/" },
    to: { path: "^(seeds|tests)/" },
  },
  {
    name: "pure-cores-stay-pure",
    comment:
      "The reasoning engine, measurement, Quick find's core and the domain's vocabulary take plain data and return plain data: no server module, database, React, framework or Node built-in.",
    severity: "error",
    from: { path: "^app/(reasoning|measure|quick-find|domain)/" },
    to: {
      path: [
        "\\.server\\.[jt]sx?$",
        "^app/(db|auth|cases|kb|workshop|audit|mail|http|config|routes|components)/",
        "(^|/)node_modules/(react|react-dom|react-router|@react-router/[^/]+|drizzle-orm|pg|nodemailer|stripe|remix-auth|remix-auth-github|@tanstack/[^/]+|cmdk)/",
      ],
    },
  },
  {
    name: "pure-cores-no-node-builtins",
    comment: "The pure cores run in the browser too (Quick find, the measurement rules): no node: modules.",
    severity: "error",
    from: { path: "^app/(reasoning|measure|quick-find|domain)/" },
    to: { dependencyTypes: ["core"] },
  },
  {
    name: "components-not-server",
    comment: "A component ships to the browser; server code reaches it only through a loader's data.",
    severity: "error",
    from: { path: "^app/components/" },
    // A type from a server module is erased before anything is bundled; only values travel.
    to: { path: "\\.server\\.[jt]sx?$", dependencyTypesNot: ["type-only"] },
  },
  {
    name: "browser-safe-not-server",
    comment:
      "A module without .server in its name may be bundled for the browser, so it may not import one that has (routes are the exception: the framework strips their server exports).",
    severity: "error",
    from: {
      path: "^app/",
      pathNot: ["\\.server\\.[jt]sx?$", "^app/routes/", "^app/entry\\.server\\.tsx$", "^app/root\\.tsx$"],
    },
    to: { path: "\\.server\\.[jt]sx?$", dependencyTypesNot: ["type-only"] },
  },
  {
    name: "no-cycles",
    comment: "A cycle makes two modules one in all but name; split out what they share instead.",
    severity: "error",
    from: { path: "^(app|seeds|scripts|tests)/" },
    to: { circular: true },
  },
];

module.exports = {
  forbidden,
  options: {
    doNotFollow: { path: "node_modules" },
    exclude: { path: "(^|/)(build|\\.react-router|\\.tmp)/" },
    tsConfig: { fileName: "tsconfig.json" },
    tsPreCompilationDeps: true,
    enhancedResolveOptions: {
      exportsFields: ["exports"],
      conditionNames: ["import", "require", "node", "default", "types"],
      extensions: [".ts", ".tsx", ".js", ".mjs", ".cjs", ".json"],
    },
  },
};
