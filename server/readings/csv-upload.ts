import { RequestHandler } from 'express';
import multer from 'multer';
import { READING_LIMITS } from '@shared/readings';
import { AppError } from '../errors/app-error';

const CSV_TYPES = new Set(['text/csv', 'text/plain', 'application/csv', 'application/vnd.ms-excel']);

const notCsv = () => new AppError('upload-not-csv', 'Only CSV files (.csv, comma-separated text) can be imported.', 415);
const tooLarge = () => new AppError('upload-too-large', `The file is larger than ${READING_LIMITS.uploadMaxBytes / 1024 / 1024} MB.`, 413);

const receive = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: READING_LIMITS.uploadMaxBytes, files: 1, fields: 10 },
  fileFilter: (_req, file, accept) => {
    const named = /\.(csv|txt)$/i.test(file.originalname);
    if (named && CSV_TYPES.has(file.mimetype)) accept(null, true);
    else accept(notCsv());
  },
}).single('file');

/** Receives one CSV file in memory as `req.file`: 413 past the size limit, 415 for anything but CSV text. */
export const csvUpload: RequestHandler = (req, res, next) => {
  receive(req, res, (error: unknown) => {
    if (!error) {
      if (!req.file) return next(new AppError('validation-failed', 'Please check these fields: file.', 400, { file: 'must be a CSV file' }));
      if (req.file.buffer.includes(0)) return next(notCsv());
      return next();
    }
    if (error instanceof multer.MulterError && error.code === 'LIMIT_FILE_SIZE') return next(tooLarge());
    if (error instanceof multer.MulterError) return next(new AppError('validation-failed', `Please check these fields: file.`, 400, { file: error.message }));
    next(error);
  });
};
