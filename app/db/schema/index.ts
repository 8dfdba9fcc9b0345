export * from "./enums";
export * from "./workshops";
export * from "./people";
export * from "./vehicles";
export * from "./knowledge";
export * from "./cases";
export * from "./audit";
export * from "./relations";
