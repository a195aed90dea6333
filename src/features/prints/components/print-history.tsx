import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { formErrorsOf } from '../../../lib/form-errors';
import { usePrints } from '../api/get-prints';
import { paperLabel } from '../print-options';
import { DownloadLink, fileSizeText, pagesText } from './print-status';

const madeFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });

/**
 * The signed-in user's prints, newest first, or only those of one make; the files are kept, so
 * each can be fetched again.
 */
export function PrintHistory({ title = 'Earlier prints', makeId }: { title?: string; makeId?: string }) {
  const prints = usePrints(makeId === undefined ? {} : { makeId });
  return (
    <section aria-label={title}>
      <h3 className="mb-2 text-base font-semibold">{title}</h3>
      {prints.isPending ? (
        <LoadingState label="Loading your prints…" />
      ) : prints.isError ? (
        <FormAlert>{formErrorsOf({}, prints.error).message}</FormAlert>
      ) : prints.data.length === 0 ? (
        <p className="text-sm text-ink-700">{makeId === undefined ? 'No prints yet.' : 'No prints of this make yet.'}</p>
      ) : (
        <ul className="flex flex-col divide-y divide-dashed divide-calico-300 text-sm">
          {prints.data.map((job) => (
            <li key={job.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 py-2">
              <span>
                <span className="font-semibold text-ink-900">{job.title}</span>{' '}
                <span className="text-ink-500">
                  {job.format.toUpperCase()} · {paperLabel(job.options.paper)} ·{' '}
                  <time dateTime={job.createdAt}>{madeFormat.format(new Date(job.createdAt))}</time>
                </span>
              </span>
              <span className="text-ink-700">
                {job.status === 'done' && (
                  <>
                    {pagesText(job)}
                    {job.fileSize !== null && `, ${fileSizeText(job.fileSize)}`} ·{' '}
                    <DownloadLink job={job} label={`Download ${job.title} (${job.format.toUpperCase()})`} />
                  </>
                )}
                {job.status === 'failed' && (
                  <span className="text-madder-700">Failed: {job.error ?? 'no reason was given.'}</span>
                )}
                {(job.status === 'queued' || job.status === 'running') && `In progress, ${job.progress} %`}
              </span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
