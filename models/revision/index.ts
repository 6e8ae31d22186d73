export * from "./content";
export * from "./state";
