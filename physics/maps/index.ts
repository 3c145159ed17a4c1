export * from "./axes";
export * from "./grid";
