export * from "./axes";
export * from "./grid";
export * from "./point";
