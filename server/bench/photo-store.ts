import { randomUUID } from "node:crypto";
import { mkdir, readFile, rm, writeFile } from "node:fs/promises";
import { join } from "node:path";
import { fileTypeFromBuffer } from "file-type";
import { PHOTO_MEDIA_TYPES, type PhotoMediaType } from "../contracts/bench";

const EXTENSIONS: Record<PhotoMediaType, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };

/** The image type read from the file's own bytes (magic numbers), or null if it is not one we take. */
export async function sniffPhotoType(bytes: Uint8Array): Promise<PhotoMediaType | null> {
  const found = await fileTypeFromBuffer(bytes);
  return found && (PHOTO_MEDIA_TYPES as readonly string[]).includes(found.mime) ? (found.mime as PhotoMediaType) : null;
}

/** Stored names are ours alone: a random UUID and the sniffed type's extension. */
const STORED_NAME = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\.(jpg|png|webp)$/;

/** Photo files under one folder (`<dataDir>/uploads`), named by the server. */
export function createPhotoStore(dir: string) {
  const pathOf = (storedName: string) => {
    // Names come from our own database, but never let one leave the folder.
    if (!STORED_NAME.test(storedName)) throw new Error(`Refusing a stored photo name that is not ours: ${storedName}`);
    return join(dir, storedName);
  };
  return {
    dir,
    async save(bytes: Uint8Array, mediaType: PhotoMediaType): Promise<string> {
      await mkdir(dir, { recursive: true, mode: 0o700 });
      const storedName = `${randomUUID()}.${EXTENSIONS[mediaType]}`;
      await writeFile(pathOf(storedName), bytes, { flag: "wx", mode: 0o600 });
      return storedName;
    },
    read: (storedName: string) => readFile(pathOf(storedName)),
    remove: (storedName: string) => rm(pathOf(storedName), { force: true }),
  };
}
export type PhotoStore = ReturnType<typeof createPhotoStore>;
