import { describedNumber } from "../params";

/**
 * The shipped time step. The fountain's height depends on it (matter-js does not converge
 * here; see DEVELOPERS.md "Simulation"): 0.25 ms with the shipped pile model puts a rod
 * chain's rise/drop near published measurements.
 */
export const SHIPPED_DT = 0.00025;

export const stepSchema = describedNumber("Time step", "s", 0.00003125, 0.001, SHIPPED_DT);
