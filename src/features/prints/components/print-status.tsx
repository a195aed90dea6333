import { FormAlert } from '../../../components/ui/form-alert';
import type { PrintJob } from '../api/schemas';

const sizeFormat = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });

export function fileSizeText(bytes: number | null): string {
  if (bytes === null) return '';
  if (bytes < 1024 * 1024) return `${sizeFormat.format(bytes / 1024)} KB`;
  return `${sizeFormat.format(bytes / 1024 / 1024)} MB`;
}

export function pagesText(job: Pick<PrintJob, 'pageCount'>): string {
  if (job.pageCount === null) return '';
  return job.pageCount === 1 ? '1 page' : `${job.pageCount} pages`;
}

/** The file's name as the server sends it, for the link's `download` attribute. */
const downloadName = (job: PrintJob) =>
  `${job.title.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'pattern'}.${job.format}`;

export function DownloadLink({ job, label }: { job: PrintJob; label?: string }) {
  if (!job.fileUrl) return null;
  return (
    <a
      href={job.fileUrl}
      download={downloadName(job)}
      className="font-semibold text-denim-700 underline decoration-denim-100 decoration-2 underline-offset-4 hover:decoration-denim-600"
    >
      {label ?? `Download ${job.format.toUpperCase()}`}
    </a>
  );
}

/** Where one print job is: waiting, drawing (with its progress), ready, or failed with the reason. */
export function PrintStatus({ job }: { job: PrintJob }) {
  if (job.status === 'failed') {
    return <FormAlert>{`The print failed: ${job.error ?? 'no reason was given.'}`}</FormAlert>;
  }
  if (job.status === 'queued' || job.status === 'running') {
    const label = job.status === 'queued' ? 'Waiting for its turn…' : 'Drawing the pages…';
    return (
      <div className="flex flex-col gap-2">
        <p role="status" className="text-sm font-medium text-ink-900">
          {label} {job.progress} %
        </p>
        <div
          role="progressbar"
          aria-label="Print progress"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={job.progress}
          className="h-2.5 overflow-hidden rounded-full bg-calico-200"
        >
          <div className="h-full bg-denim-600 transition-[width]" style={{ width: `${job.progress}%` }} />
        </div>
      </div>
    );
  }
  const empty = job.emptyPages ?? [];
  return (
    <div role="status" className="flex flex-col gap-2 rounded-md border border-sage-700/40 bg-sage-50 px-3.5 py-2.5 text-sm text-ink-900">
      <p className="font-semibold text-sage-700">
        Ready: {pagesText(job)}, {job.format.toUpperCase()}
        {job.fileSize !== null && `, ${fileSizeText(job.fileSize)}`}.
      </p>
      <p>
        {empty.length === 0
          ? 'No page was left out.'
          : `Left out ${empty.length === 1 ? '1 empty page' : `${empty.length} empty pages`} that no piece reaches: ${empty.join(', ')}. The assembly map on the first page shows them greyed.`}
      </p>
      <p>
        <DownloadLink job={job} />
      </p>
    </div>
  );
}
