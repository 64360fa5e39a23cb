import { fileTypeFromBuffer } from 'file-type';
import type { DataSource } from 'typeorm';
import { Animal } from '../db/entities/animal.entity';
import { AppError, notFound } from '../http/app-error';
import { findAnimal } from '../animals/find-animal';
import { PHOTO_TYPES, type PhotoExt, type PhotoStore } from './photo-store';

const BY_MIME: Record<string, PhotoExt> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };

export class PhotosService {
  constructor(private readonly db: DataSource, private readonly store: PhotoStore) {}

  /**
   * The file's type is read from its content (magic numbers), never from its name or the
   * browser's claim: only JPEG, PNG and WebP are kept. A new photo replaces the old one.
   */
  async save(rabbitryId: number, animalId: number, content: Buffer): Promise<{ type: string; bytes: number }> {
    const animal = await findAnimal(this.db.manager, rabbitryId, animalId);
    const detected = await fileTypeFromBuffer(content);
    const ext = detected ? BY_MIME[detected.mime] : undefined;
    if (!ext) {
      const message = `The file is ${detected ? `a ${detected.ext.toUpperCase()} file` : 'not an image we can read'}; upload a JPEG, PNG or WebP photo`;
      throw new AppError('validation', message, 400, { photo: message });
    }
    const path = await this.store.save(rabbitryId, animalId, ext, content);
    if (animal.photoPath && animal.photoPath !== path) await this.store.remove(animal.photoPath);
    await this.db.getRepository(Animal).update({ id: animalId }, { photoPath: path });
    return { type: PHOTO_TYPES[ext], bytes: content.length };
  }

  async file(rabbitryId: number, animalId: number): Promise<{ root: string; path: string; type: string }> {
    const animal = await findAnimal(this.db.manager, rabbitryId, animalId);
    if (!animal.photoPath) throw notFound('Photo');
    const ext = animal.photoPath.split('.').pop() as PhotoExt;
    return { root: this.store.root, path: animal.photoPath, type: PHOTO_TYPES[ext] };
  }
}
