import { projectPath } from "../../server/paths";

/** Everything tests create lives under .data/test (git-ignored), apart from kept output. */
export const TEST_DATA_DIR = projectPath(".data", "test");
export const TEST_PG_DIR = projectPath(".data", "test", "postgres");
/** Screenshots and other artefacts worth keeping from a run. */
export const TEST_OUTPUT_DIR = projectPath("tests", "output");
