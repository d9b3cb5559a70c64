import { Job, StoredFile, User } from '../models';
import {
  moveIntoStorage,
  newStoredName,
  removeQuietly,
  storedPath,
  type PlanContentType,
} from '../services/storage';
import { audit } from './audit';

/** A checked upload waiting in the temp folder. */
export interface CheckedUpload {
  tempPath: string;
  originalName: string;
  contentType: PlanContentType;
  size: number;
}

/**
 * Keep a checked plan on a job: the row, the audit event and the move into storage succeed
 * together; if the database refuses, the moved file is removed again so nothing is orphaned.
 */
export async function storePlanFile(actor: User, job: Job, upload: CheckedUpload) {
  const storedName = newStoredName(upload.contentType);
  try {
    const file = await StoredFile.sequelize!.transaction(async (t) => {
      const row = await StoredFile.create(
        {
          plantId: job.plantId,
          customerId: job.customerId,
          jobId: job.id,
          originalName: upload.originalName,
          storedName,
          contentType: upload.contentType,
          size: upload.size,
          uploadedBy: actor.id,
        },
        { transaction: t },
      );
      await audit(t, {
        plantId: job.plantId,
        actorId: actor.id,
        action: 'job.file_uploaded',
        subjectType: 'job',
        subjectId: job.id,
        data: { fileId: row.id, name: row.originalName, contentType: row.contentType },
      });
      // Last, so a failed insert never leaves a stored file behind.
      await moveIntoStorage(upload.tempPath, storedName);
      return row;
    });
    file.uploader = actor;
    return file;
  } catch (e) {
    await removeQuietly(upload.tempPath);
    await removeQuietly(storedPath(storedName));
    throw e;
  }
}

/** Remove a plan from its job: row and audit event together, then the bytes on disk. */
export async function deletePlanFile(actor: User, file: StoredFile) {
  await StoredFile.sequelize!.transaction(async (t) => {
    await file.destroy({ transaction: t });
    await audit(t, {
      plantId: file.plantId,
      actorId: actor.id,
      action: 'job.file_deleted',
      subjectType: 'job',
      subjectId: file.jobId,
      data: { fileId: file.id, name: file.originalName },
    });
  });
  // After the commit: a failed unlink leaves an unreachable file, never a row without bytes.
  await removeQuietly(storedPath(file.storedName));
}
