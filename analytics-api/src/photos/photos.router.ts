import type { RequestHandler } from 'express';
import multer from 'multer';
import { ANY_RABBITRY_ROLE, RABBITRY_EDITORS } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { AppError, notFound } from '../http/app-error';
import { idParam } from '../http/validate';
import type { PhotosService } from './photos.service';

export const PHOTO_LIMIT_MB = 5;

export function registerPhotoRoutes(r: RouteRegistrar, service: PhotosService): void {
  const path = '/rabbitries/:rabbitryId/animals/:animalId/photo';
  // Memory storage: the bytes are checked before anything is written to disk.
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: PHOTO_LIMIT_MB * 1024 * 1024, files: 1 } }).single('photo');
  const receive: RequestHandler = (req, res, next) => upload(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError) {
      return next(err.code === 'LIMIT_FILE_SIZE'
        ? new AppError('too-large', `A photo may be at most ${PHOTO_LIMIT_MB} MB`, 413)
        : new AppError('bad-upload', `The upload was not understood (${err.message}); send the photo in the field "photo"`, 400));
    }
    next(err);
  });

  r.add('post', path, RABBITRY_EDITORS, receive, async (req, res) => {
    if (!req.file) throw new AppError('validation', 'Choose a photo to upload', 400, { photo: 'Choose a photo to upload' });
    res.status(201).json(await service.save(res.locals.access.rabbitryId!, idParam(req.params.animalId, 'Animal'), req.file.buffer));
  });
  r.add('get', path, ANY_RABBITRY_ROLE, async (req, res, next) => {
    const photo = await service.file(res.locals.access.rabbitryId!, idParam(req.params.animalId, 'Animal'));
    res.set('Cache-Control', 'private, max-age=300').type(photo.type).sendFile(photo.path, { root: photo.root }, (err) => {
      if (err && !res.headersSent) next(notFound('Photo'));
    });
  });
}
