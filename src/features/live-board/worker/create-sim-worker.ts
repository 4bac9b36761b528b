/** A module worker running the simulation (Vite bundles sim/ and matter-js into its own chunk). */
export const createSimWorker = () => new Worker(new URL("./sim.worker.ts", import.meta.url), { type: "module", name: "linkleap-sim" });
