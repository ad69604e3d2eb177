import { RequestHandler } from 'express';
import multer from 'multer';
import { extname } from 'node:path';
import { DENSITY_TABLE_UPLOAD } from '@shared/reference-tables';
import { AppError } from '../errors/app-error';

const kb = Math.round(DENSITY_TABLE_UPLOAD.maxBytes / 1000);

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: DENSITY_TABLE_UPLOAD.maxBytes, files: 1, fields: 10 },
  fileFilter: (_req, file, accept) => {
    const okName = (DENSITY_TABLE_UPLOAD.extensions as readonly string[]).includes(extname(file.originalname).toLowerCase());
    const okType = (DENSITY_TABLE_UPLOAD.mimeTypes as readonly string[]).includes(file.mimetype);
    if (okName && okType) return accept(null, true);
    accept(new AppError('unsupported-file', 'Only a CSV file (.csv) can be uploaded as a density table.', 415, { file: 'must be a .csv file' }));
  },
}).single('file');

/** Reads one CSV file of at most DENSITY_TABLE_UPLOAD.maxBytes from a multipart form: 413 when larger, 415 when not CSV. */
export const tableUpload: RequestHandler = (req, res, next) => {
  upload(req, res, (error: unknown) => {
    if (!error) return next();
    if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') {
      return next(new AppError('file-too-large', `The file is larger than ${kb} kB.`, 413, { file: `must be at most ${kb} kB` }));
    }
    if (error instanceof multer.MulterError) return next(new AppError('bad-upload', `The upload could not be read: ${error.message}.`, 400, { file: error.message }));
    next(error);
  });
};
