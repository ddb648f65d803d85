export * from "./statuses";
export * from "./transitions";
export * from "./stage-from-facts";
export * from "./waiting-on";
export * from "./inspections";
