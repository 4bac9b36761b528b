import { randomInt } from "node:crypto";
import { LESSON_CODE_ALPHABET, LESSON_CODE_LENGTH } from "../contracts/lesson-rules";

/** A fresh lesson code from the unambiguous alphabet; uniqueness among open lessons is the database's job. */
export function newLessonCode(pick: (max: number) => number = randomInt): string {
  let code = "";
  for (let i = 0; i < LESSON_CODE_LENGTH; i++) code += LESSON_CODE_ALPHABET[pick(LESSON_CODE_ALPHABET.length)];
  return code;
}
