export * from "./content";
export * from "./state";
export * from "./attachment-kinds";
