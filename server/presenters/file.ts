import type { StoredFile as StoredFileShape } from '../../shared/api/pricing';
import type { StoredFile, User } from '../models';
import { filePolicy } from '../policies/file';

/** A plan file row, with whether the viewer may delete it (the policy decides, the client shows). */
export type PlanFileRow = StoredFileShape;

/** A stored plan file as the client sees it: the user's name for it, never the stored name. */
export function presentStoredFile(f: StoredFile, viewer: User): PlanFileRow {
  return {
    id: f.id,
    jobId: f.jobId,
    name: f.originalName,
    contentType: f.contentType,
    size: f.size,
    uploadedBy: f.uploader?.name ?? null,
    createdAt: f.createdAt.toISOString(),
    canDelete: filePolicy.remove(viewer, f),
  };
}
