/**
 * Closed-form theory for every rig, with sources in the comments of each file.
 * SI units throughout (m, s, kg, N, W); g defaults to STANDARD_G = 9.81 m/s².
 */
export { STANDARD_G } from "./constants";
export * from "./fountain";
export * from "./link-push";
export * from "./catenary";
export * from "./scale";
export * from "./heap";
export * from "./folded";
export * from "./edge";
export * from "./theory-notes";
export * from "./sig-figs";
