import { useState } from 'react';
import { Button, Dialog, EmptyState, ErrorMessage } from '../../../components/ui';
import { focusRing } from '../../../components/ui/focus';
import { formatDateTime } from '../../../lib/format';
import { useDeletePlanFile } from '../api/delete-plan-file';
import { planFileUrl, type PlanFileRow } from '../api/list-plan-files';
import { formatFileSize, planTypeLabel } from '../plan-file-rules';

/** Props of {@link PlanFileList}. */
export interface PlanFileListProps {
  jobId: number;
  files: PlanFileRow[];
}

const linkClass = `font-medium text-timber-700 underline-offset-2 hover:underline focus-visible:rounded ${focusRing}`;

/** The job's plans: name (downloads), type, size, who and when; delete asks first. */
export function PlanFileList({ jobId, files }: PlanFileListProps) {
  const [doomed, setDoomed] = useState<PlanFileRow | null>(null);
  const remove = useDeletePlanFile(jobId);
  const close = () => {
    setDoomed(null);
    remove.reset();
  };

  if (files.length === 0)
    return (
      <EmptyState title="No plans yet">
        Plans the builder or the sales desk upload for this job appear here.
      </EmptyState>
    );
  return (
    <>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Plan files of this job</caption>
          <thead className="border-b border-sand-200 text-xs font-semibold tracking-wide text-sand-600 uppercase">
            <tr>
              <th scope="col" className="px-4 py-2">
                Name
              </th>
              <th scope="col" className="px-4 py-2">
                Type
              </th>
              <th scope="col" className="px-4 py-2 text-right">
                Size
              </th>
              <th scope="col" className="px-4 py-2">
                Uploaded by
              </th>
              <th scope="col" className="px-4 py-2">
                When
              </th>
              <th scope="col" className="px-4 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-sand-200 text-base text-sand-900">
            {files.map((f) => (
              <tr key={f.id}>
                <td className="max-w-xs px-4 py-2 break-words">
                  <a href={planFileUrl(f.id)} download={f.name} className={linkClass}>
                    {f.name}
                  </a>
                </td>
                <td className="px-4 py-2">{planTypeLabel(f.contentType)}</td>
                <td className="px-4 py-2 text-right tabular-nums">{formatFileSize(f.size)}</td>
                <td className="px-4 py-2">{f.uploadedBy ?? '—'}</td>
                <td className="px-4 py-2 whitespace-nowrap">{formatDateTime(f.createdAt)}</td>
                <td className="px-4 py-2 text-right whitespace-nowrap">
                  <a
                    href={planFileUrl(f.id)}
                    download={f.name}
                    aria-label={`Download ${f.name}`}
                    className={`mr-3 text-sm ${linkClass}`}
                  >
                    Download
                  </a>
                  {f.canDelete ? (
                    <Button
                      variant="ghost"
                      size="sm"
                      aria-label={`Delete ${f.name}`}
                      onClick={() => setDoomed(f)}
                    >
                      Delete
                    </Button>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Dialog
        open={doomed !== null}
        title="Delete this plan?"
        onClose={close}
        footer={
          <>
            <Button variant="secondary" onClick={close}>
              Keep it
            </Button>
            <Button
              variant="danger"
              busy={remove.isPending}
              onClick={() => doomed && remove.mutate(doomed.id, { onSuccess: close })}
            >
              Delete plan
            </Button>
          </>
        }
      >
        <p>
          <span className="font-medium text-sand-900">{doomed?.name}</span> will be removed from
          this job for everyone. This cannot be undone.
        </p>
        {remove.error ? <ErrorMessage className="mt-3" error={remove.error} /> : null}
      </Dialog>
    </>
  );
}
