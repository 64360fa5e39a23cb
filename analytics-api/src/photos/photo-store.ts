import { mkdir, rm, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

export const PHOTO_TYPES = { jpg: 'image/jpeg', png: 'image/png', webp: 'image/webp' } as const;
export type PhotoExt = keyof typeof PHOTO_TYPES;

/**
 * Animal photos on disk: `<dataDir>/photos/<rabbitryId>/<animalId>.<ext>`. The stored path is
 * relative to the data folder and built from ids only, so no uploaded name reaches the disk.
 */
export class PhotoStore {
  /** Absolute data folder; files are served relative to it (a dot-folder like .data must not hide them). */
  readonly root: string;
  constructor(dataDir: string) {
    this.root = resolve(dataDir);
  }

  relativePath(rabbitryId: number, animalId: number, ext: PhotoExt): string {
    return join('photos', String(rabbitryId), `${animalId}.${ext}`);
  }

  private absolute(relative: string): string {
    return join(this.root, relative);
  }

  async save(rabbitryId: number, animalId: number, ext: PhotoExt, content: Buffer): Promise<string> {
    const rel = this.relativePath(rabbitryId, animalId, ext);
    await mkdir(join(this.root, 'photos', String(rabbitryId)), { recursive: true });
    await writeFile(this.absolute(rel), content);
    return rel;
  }

  async remove(relative: string | null): Promise<void> {
    if (relative) await rm(this.absolute(relative), { force: true });
  }
}
