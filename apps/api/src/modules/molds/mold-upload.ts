import multer from 'multer';
import type { RequestHandler } from 'express';
import { AppError } from '../../http/errors';

export const MAX_STL_BYTES = 100 * 1024 * 1024;

/**
 * Reads the one `file` part into memory, refusing while it streams once it passes the size limit
 * (OWASP File Upload Cheat Sheet: limit size before the whole body is read).
 */
export function stlUpload(maxBytes = MAX_STL_BYTES): RequestHandler {
  const handler = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: maxBytes, files: 1, fields: 8, fieldSize: 4096, parts: 12 },
  }).single('file');
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) {
      return next(new AppError('bad_request', 'multipart_required', 'send the mould as multipart/form-data with the file (STL, 3MF or OBJ) in a part named "file"'));
    }
    handler(req, res, (err?: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return next(new AppError('payload_too_large', 'file_too_large', `the mould file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB; simplify the mesh (fewer triangles) or split the mould`));
        }
        if (err.code === 'LIMIT_UNEXPECTED_FILE') return next(new AppError('bad_request', 'unexpected_file', 'send exactly one file, in the part named "file"'));
        return next(new AppError('bad_request', 'bad_upload', `the upload could not be read (${err.message})`));
      }
      next(new AppError('bad_request', 'bad_upload', 'the upload could not be read; send it again'));
    });
  };
}
