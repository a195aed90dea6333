import { Fragment } from 'react';
import type { OutboxMessage } from '../api/get-outbox';

const receivedFormat = new Intl.DateTimeFormat(undefined, {
  dateStyle: 'medium',
  timeStyle: 'short',
});

const urlPattern = /(https?:\/\/[^\s<>"]+)/g;

/** Plain text with its web addresses made clickable (reset links, for one). */
function LinkedText({ text }: { text: string }) {
  return text.split(urlPattern).map((part, index) =>
    index % 2 === 1 ? (
      <a
        key={index}
        href={part}
        className="break-all font-semibold text-denim-700 underline underline-offset-2"
      >
        {part}
      </a>
    ) : (
      <Fragment key={index}>{part}</Fragment>
    ),
  );
}

export function OutboxList({ messages }: { messages: OutboxMessage[] }) {
  if (messages.length === 0) {
    return (
      <p className="text-ink-700">
        No e-mail has been sent since the server started. Password-reset requests land here.
      </p>
    );
  }

  return (
    <ul className="flex flex-col gap-3">
      {messages.map((message) => (
        <li key={message.id}>
          <details className="group rounded-md border border-calico-300 bg-calico-50 open:shadow-sm">
            <summary className="flex cursor-pointer list-none flex-wrap items-baseline justify-between gap-x-4 gap-y-1 px-4 py-3 hover:bg-calico-100">
              <span className="font-semibold text-ink-900">
                <span aria-hidden className="mr-2 inline-block text-chalk-600 transition-transform group-open:rotate-90">
                  ▸
                </span>
                {message.subject || '(no subject)'}
              </span>
              <span className="text-sm text-ink-500">
                to {message.to.join(', ')} ·{' '}
                <time dateTime={message.receivedAt}>
                  {receivedFormat.format(new Date(message.receivedAt))}
                </time>
              </span>
            </summary>
            <div className="border-t border-dashed border-calico-300 px-4 py-3">
              <dl className="mb-3 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
                <dt className="text-ink-500">From</dt>
                <dd>{message.from}</dd>
                <dt className="text-ink-500">To</dt>
                <dd>{message.to.join(', ')}</dd>
              </dl>
              <pre className="whitespace-pre-wrap break-words font-sans text-sm text-ink-900">
                <LinkedText text={message.text} />
              </pre>
              {message.html !== null && (
                <p className="mt-3 text-xs text-ink-500">
                  This message also has an HTML part; the outbox shows its plain text only.
                </p>
              )}
            </div>
          </details>
        </li>
      ))}
    </ul>
  );
}
