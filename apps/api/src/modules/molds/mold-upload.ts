import { createHash } from 'node:crypto';
import busboy from 'busboy';
import type { Request, RequestHandler, Response } from 'express';
import { AppError } from '../../http/errors';
import { UPLOAD_SHA256_LOCAL } from '../../http/idempotency';

export const MAX_STL_BYTES = 100 * 1024 * 1024;

/** Room for the multipart framing and the text fields around the file in a request's declared length. */
const FORM_OVERHEAD_BYTES = 64 * 1024;

/** The mould file as it arrived: its bytes (in memory shared with the checking thread), size and SHA-256. */
export interface UploadedMould {
  originalname: string;
  bytes: Uint8Array;
  size: number;
  sha256: string;
}

const uploadKey = 'mouldUpload';

/** The file the upload middleware read for this request, if one came. */
export function uploadedMould(res: Response): UploadedMould | undefined {
  return res.locals[uploadKey] as UploadedMould | undefined;
}

const tooLarge = (maxBytes: number) =>
  new AppError(
    'payload_too_large',
    'file_too_large',
    `the mould file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB; simplify the mesh (fewer triangles) or split the mould`,
  );

// The HTML standard escapes LF, CR and " in multipart names as %0A, %0D and %22; nothing else is escaped.
function decodeFormDataName(name: string): string {
  return name.replace(/%0A|%0D|%22/gi, (m) => ({ '%0A': '\n', '%0D': '\r', '%22': '"' })[m.toUpperCase()]!);
}

/**
 * Reads the one `file` part as it streams in: hashed and counted chunk by chunk, written once into memory the
 * checking thread shares, and refused with a 413 the moment it passes the size limit (or at once when the request
 * says it is larger), without reading the rest into memory (OWASP File Upload Cheat Sheet: limit the size before
 * the whole body is read). The text fields become the request body.
 */
export function stlUpload(maxBytes = MAX_STL_BYTES): RequestHandler {
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) {
      return next(
        new AppError('bad_request', 'multipart_required', 'send the mould as multipart/form-data with the file (STL, 3MF or OBJ) in a part named "file"'),
      );
    }
    const declared = Number(req.get('content-length'));
    if (Number.isFinite(declared) && declared > maxBytes + FORM_OVERHEAD_BYTES) return refuse(req, res, next, tooLarge(maxBytes));
    let parser: busboy.Busboy;
    try {
      parser = busboy({ headers: req.headers, limits: { fileSize: maxBytes + 1, files: 1, fields: 8, fieldSize: 4096, parts: 12 } });
    } catch {
      return next(
        new AppError('bad_request', 'bad_upload', 'the upload could not be read (the multipart boundary is missing); send it again as multipart/form-data'),
      );
    }
    // Sized from the declared length: the pages are only taken as bytes are written into them.
    const capacity = Math.min(Number.isFinite(declared) && declared > 0 ? declared : maxBytes, maxBytes);
    const body: Record<string, string> = Object.create(null) as Record<string, string>;
    let sawFile = false;
    let upload: Promise<UploadedMould> | undefined;
    let settled = false;
    const fail = (err: AppError) => {
      if (settled) return;
      settled = true;
      req.unpipe(parser);
      refuse(req, res, next, err);
    };

    parser.on('file', (field, stream, info) => {
      if (field !== 'file' || sawFile) {
        stream.resume();
        return fail(new AppError('bad_request', 'unexpected_file', 'send exactly one file, in the part named "file"'));
      }
      sawFile = true;
      const store = new Uint8Array(new SharedArrayBuffer(capacity));
      const hash = createHash('sha256');
      let size = 0;
      stream.on('limit', () => fail(tooLarge(maxBytes)));
      stream.on('data', (chunk: Buffer) => {
        if (settled) return;
        if (size + chunk.length > store.length) return fail(tooLarge(maxBytes));
        store.set(chunk, size);
        hash.update(chunk);
        size += chunk.length;
      });
      upload = new Promise((resolve) =>
        stream.on('end', () =>
          resolve({ originalname: decodeFormDataName(info.filename ?? ''), bytes: store.subarray(0, size), size, sha256: hash.digest('hex') }),
        ),
      );
    });
    parser.on('field', (name, value, info) => {
      if (info.valueTruncated) return fail(new AppError('bad_request', 'field_too_long', `the field "${name.slice(0, 40)}" is longer than 4096 characters`));
      const key = decodeFormDataName(name);
      if (key in body) return fail(new AppError('bad_request', 'field_twice', `the field "${key.slice(0, 40)}" is sent twice; send each field once`));
      body[key] = value;
    });
    parser.on('filesLimit', () => fail(new AppError('bad_request', 'unexpected_file', 'send exactly one file, in the part named "file"')));
    parser.on('fieldsLimit', () =>
      fail(new AppError('bad_request', 'bad_upload', 'the upload has too many fields; send the file with units, up, name and pieceId only')),
    );
    parser.on('partsLimit', () =>
      fail(new AppError('bad_request', 'bad_upload', 'the upload has too many parts; send the file with units, up, name and pieceId only')),
    );
    parser.on('error', (err: Error) => fail(new AppError('bad_request', 'bad_upload', `the upload could not be read (${err.message}); send it again`)));
    parser.on('close', () => {
      void (upload ?? Promise.resolve(undefined)).then((file) => {
        if (settled) return;
        settled = true;
        req.body = body;
        if (file) {
          res.locals[uploadKey] = file;
          res.locals[UPLOAD_SHA256_LOCAL] = file.sha256;
        }
        next();
      });
    });
    req.on('close', () => {
      if (!req.complete) fail(new AppError('bad_request', 'upload_aborted', 'the upload was cut off before it ended; send it again'));
    });
    req.pipe(parser);
  };
}

/**
 * Answers at once and drops the rest of the body as it comes (nothing more is kept), closing the connection after
 * the answer so a client still sending does not hold it for another request.
 */
function refuse(req: Request, res: Response, next: (err: unknown) => void, err: AppError): void {
  res.setHeader('Connection', 'close');
  req.resume();
  next(err);
}
