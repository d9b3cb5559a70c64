import { createReadStream } from 'node:fs';
import { pipeline } from 'node:stream/promises';
import { Router } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { authorize } from '../../policies/predicates';
import { jobPolicy } from '../../policies/job';
import { filePolicy } from '../../policies/file';
import { deletePlanFile, storePlanFile, type CheckedUpload } from '../../commands/files';
import { Job, StoredFile, User } from '../../models';
import { presentStoredFile } from '../../presenters/file';
import { AppError } from '../../errors';
import { attachmentHeader, downloadName, storedPath, storedSize } from '../../services/storage';
import { handle, load } from '../load';
import { checkPlanType, receivePlan } from './upload';

const withUploader = [{ model: User, as: 'uploader', attributes: ['id', 'name'] }];

const findJob = (id: number, actor: User) =>
  Job.findOne({ where: { [Op.and]: [{ id }, jobPolicy.scope(actor)] } });

/** Find a plan file within the actor's scope (plant, and company for builders). */
export const findFile = (id: number, actor: User) =>
  StoredFile.findOne({
    where: { [Op.and]: [{ id }, filePolicy.scope(actor)] },
    include: withUploader,
  });

/**
 * Builders' plans on a job: `/jobs/:id/files` (list, upload) and `/files/:id` (download, delete).
 * Mounted at `/api`.
 */
export function filesRouter() {
  const router = Router();

  router.get(
    '/jobs/:id/files',
    requireUser,
    load('Job', findJob),
    authorize(filePolicy.list),
    handle(async (req, res) => {
      const job = res.locals.record as Job;
      const files = await StoredFile.findAll({
        where: { [Op.and]: [{ jobId: job.id }, filePolicy.scope(req.user!)] },
        include: withUploader,
        order: [
          ['createdAt', 'DESC'],
          ['id', 'DESC'],
        ],
      });
      res.json(files.map((f) => presentStoredFile(f, req.user!)));
    }),
  );

  // The body is read only after load and authorize, so a refused caller never fills the disk.
  router.post(
    '/jobs/:id/files',
    requireUser,
    load('Job', findJob),
    authorize(filePolicy.upload),
    receivePlan,
    checkPlanType,
    handle(async (req, res) => {
      const upload = res.locals.upload as CheckedUpload;
      const file = await storePlanFile(req.user!, res.locals.record as Job, upload);
      res.status(201).json(presentStoredFile(file, req.user!));
    }),
  );

  router.get(
    '/files/:id',
    requireUser,
    load('File', findFile),
    authorize(filePolicy.download),
    handle(async (_req, res) => {
      const file = res.locals.record as StoredFile;
      const size = await storedSize(file.storedName);
      if (size === null)
        throw new AppError(404, 'not_found', 'The plan file is missing from storage.');
      res.set({
        'Content-Type': file.contentType,
        'Content-Length': String(size),
        'Content-Disposition': attachmentHeader(downloadName(file.originalName, file.contentType)),
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': 'private, no-store',
      });
      try {
        await pipeline(createReadStream(storedPath(file.storedName)), res);
      } catch (e) {
        // Once bytes have gone out no error body can follow; a cut connection is simply closed.
        if (!res.headersSent) throw e;
        res.destroy();
      }
    }),
  );

  router.delete(
    '/files/:id',
    requireUser,
    load('File', findFile),
    authorize(filePolicy.remove),
    handle(async (req, res) => {
      await deletePlanFile(req.user!, res.locals.record as StoredFile);
      res.status(204).end();
    }),
  );

  return router;
}
