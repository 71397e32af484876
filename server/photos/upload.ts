import multer from 'multer';
import type { RequestHandler } from 'express';
import { AppError } from '../errors';
import { MAX_PHOTO_BYTES, tooLarge } from './image-pipeline';

// Memory storage: a refused upload never touches the disk.
const multerSingle = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 10, fieldSize: 4096, parts: 12 },
}).single('photo');

/** Reads one multipart file field named "photo"; multer's errors become messages a person can act on. */
export const photoUpload: RequestHandler = (req, res, next) => {
  multerSingle(req, res, (err?: unknown) => {
    if (!err) {
      if (!req.file) return next(new AppError(400, 'photo_missing', 'No photo arrived. Choose or take a photo and send it in the "photo" field.'));
      return next();
    }
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') return next(tooLarge());
      if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') {
        return next(new AppError(400, 'photo_field', 'Send one photo at a time, in the "photo" field.'));
      }
      return next(new AppError(400, 'photo_upload', 'The upload could not be read. Try sending the photo again.'));
    }
    // Malformed multipart bodies come from busboy as plain errors.
    return next(new AppError(400, 'photo_upload', 'The upload could not be read. Try sending the photo again.'));
  });
};
