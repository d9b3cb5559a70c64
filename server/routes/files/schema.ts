export { MAX_UPLOAD_BYTES, storedFileSchema } from '../../../shared/api/pricing';
export type { StoredFile } from '../../../shared/api/pricing';
