import multer from 'multer';
import type { RequestHandler } from 'express';
import { AppError } from '../errors';
import { GUEST_CAPS } from './guest-limits';

const MB = GUEST_CAPS.maxPhotoBytes / 1024 / 1024;

/** A photo over the guest size cap; the message says what to do. */
export const guestPhotoTooLarge = () =>
  new AppError(413, 'photo_too_large', `That photo is larger than ${MB} MB. Use the camera's normal photo size, or send a smaller copy.`);

// Memory storage, a smaller size cap than staff uploads and nothing but the one file and two short fields.
const single = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: GUEST_CAPS.maxPhotoBytes, files: 1, fields: 4, fieldSize: 1024, parts: 6 },
}).single('photo');

/** Reads one guest photo from multipart field "photo"; the same checks as staff photos follow in the photo pipeline. */
export const guestPhotoUpload: RequestHandler = (req, res, next) => {
  single(req, res, (err?: unknown) => {
    if (!err) {
      if (!req.file) return next(new AppError(400, 'photo_missing', 'No photo arrived. Choose or take a photo and send it again.'));
      return next();
    }
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') return next(guestPhotoTooLarge());
    if (err instanceof multer.MulterError && (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT')) {
      return next(new AppError(400, 'photo_field', 'Send one photo at a time.'));
    }
    next(new AppError(400, 'photo_upload', 'The upload could not be read. Try sending the photo again.'));
  });
};
