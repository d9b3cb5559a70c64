import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError, badRequest } from '../../errors';
import {
  removeQuietly,
  sanitiseFileName,
  sniffPlanType,
  uploadTempDir,
} from '../../services/storage';
import type { CheckedUpload } from '../../commands/files';
import { MAX_UPLOAD_BYTES } from './schema';
import {
  PLAN_TOO_LARGE_MESSAGE as TOO_LARGE_MESSAGE,
  UNSUPPORTED_PLAN_TYPE_MESSAGE as UNSUPPORTED_TYPE_MESSAGE,
} from '../../../shared/api/pricing';

// Disk, not memory: 25 MB per request held in RAM would let a few uploads exhaust the server.
const multipart = multer({
  storage: multer.diskStorage({
    destination: (_req, _file, cb) => {
      try {
        cb(null, uploadTempDir());
      } catch (e) {
        cb(e as Error, '');
      }
    },
    filename: (_req, _file, cb) => cb(null, `${randomUUID()}.part`),
  }),
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 4, parts: 5 },
  defParamCharset: 'utf8', // browsers send UTF-8 file names; busboy's default would read latin1
}).single('file');

function multipartError(err: unknown): Error {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new AppError(413, 'too_large', TOO_LARGE_MESSAGE);
    return badRequest('Send one plan file in the form field "file".', {
      file: 'Send one plan file.',
    });
  }
  // busboy's complaints (a truncated or malformed body) are the client's mistake, not ours.
  if (err instanceof Error && !(err instanceof AppError) && !('status' in err))
    return badRequest('The upload was incomplete. Try again.');
  return err as Error;
}

/**
 * Receive one multipart file into the temp folder (multer removes what it wrote on a refusal),
 * then check its type from its bytes. Whatever happens next, the temp file is gone when the
 * response ends: it was either moved into storage or refused.
 */
export const receivePlan: RequestHandler = (req, res, next) => {
  res.on('close', () => void removeQuietly(req.file?.path));
  multipart(req, res, (err?: unknown) => {
    if (err) return next(multipartError(err));
    if (!req.file)
      return next(badRequest('Choose a plan file to upload.', { file: 'Choose a plan file.' }));
    next();
  });
};

/** The validate step of an upload: the type comes from the content, never the name or header. */
export const checkPlanType: RequestHandler = async (req, res, next) => {
  try {
    const file = req.file!;
    const contentType = await sniffPlanType(file.path);
    if (!contentType) {
      await removeQuietly(file.path);
      return next(new AppError(415, 'unsupported_type', UNSUPPORTED_TYPE_MESSAGE));
    }
    const upload: CheckedUpload = {
      tempPath: file.path,
      originalName: sanitiseFileName(file.originalname),
      contentType,
      size: file.size,
    };
    res.locals.upload = upload;
    next();
  } catch (e) {
    next(e);
  }
};
