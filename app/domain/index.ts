// The domain's vocabulary, defined once and browser-safe: the database enums, zod schemas,
// permissions, the reasoning core, the screens and the seeds all import it from here.
export * from "./case-access";
export * from "./cases";
export * from "./conditions";
export * from "./countries";
export * from "./knowledge";
export * from "./people";
export * from "./permissions";
export * from "./readings";
export * from "./vehicles";
export * from "./owner-side";
export * from "./estimate-document";
