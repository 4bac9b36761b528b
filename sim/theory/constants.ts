/**
 * Gravitational acceleration used by every theory function unless the caller passes `g`, in m/s².
 *
 * 9.80665 m/s² is standard gravity (the conventional value fixed by the CGPM in 1901); the check
 * values in our physics reference (physics-reference.md §3) and most textbook worked examples use
 * 9.81 m/s², so the theory defaults to that and tests reproduce the printed figures with it.
 */
export const STANDARD_G = 9.81;
