export * from "./fragment";
export * from "./schema";
export * from "./mentions";
export * from "./describe";
export * from "./model-point";
export * from "./annotation";
export type * from "./dto";
