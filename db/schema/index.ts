export * from "./auth";
export * from "./studio";
export * from "./library";
export * from "./boards";
export * from "./decisions";
export * from "./spec";
export * from "./audit";
