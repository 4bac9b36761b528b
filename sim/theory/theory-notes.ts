/**
 * Plain-English notes for the board, shown beside theory and simulated values.
 * Written for pupils and teachers; sources are in the comments, not in the text.
 */

/**
 * Shown wherever a simulated fountain height appears. How hard the pile pushes depends on how the
 * links lie in the pot, which a rigid-body engine cannot settle from first principles (see the
 * sim's notes); so the pile is tuned to match published measurements, and what the class should
 * take from the simulation is the mechanism, not the exact height.
 */
export const CALIBRATED_PILE_NOTE =
  "How high the simulated chain rises depends on how hard the pile pushes on each link as it " +
  "leaves, and that depends on how the links happen to be packed. We set up the simulated pile so " +
  "that its rise matches what has been measured with real chains. What the simulation works out " +
  "for itself is the mechanism: chains of stiff rods rise above the pot, beads on floppy threads " +
  "do not, and the higher the pot stands above the floor, the higher the chain rises.";

/**
 * Shown with the link-geometry explanation (pushRatio / idealAlphaBound).
 * Sources: Biggins & Warner, Proc. R. Soc. A 470: 20130689 (2014) (the rod-kick explanation);
 * Pantaleone, Am. J. Phys. 85 (2017); Flekkøy, Moura & Måløy, Front. Phys. 6:84 (2018);
 * Martins, arXiv:1612.09319 (2016) and arXiv:1810.13008 (2018) (other views).
 */
export const ROD_KICK_MODEL_NOTE =
  "The usual published explanation: a stiff link jerked up at one end levers against the pile " +
  "with its other end, so the pile pushes the chain upwards as well as the falling chain pulling " +
  "it. That push is what lifts the chain above the pot. Physicists still discuss the details: " +
  "later studies point out that the way the pile is packed matters, and some argue that other " +
  "effects contribute too. Treat it as the best-known explanation, not the final word.";

/** Shown with the typical push coefficient (TYPICAL_ALPHA). */
export const TYPICAL_ALPHA_NOTE =
  "The default push of 0.12 comes from fitting measured fountains; real chains usually rise " +
  "to about a tenth of the drop from pot to floor. Ideal stiff rods could reach at most half.";
