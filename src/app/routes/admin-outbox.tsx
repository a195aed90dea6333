import { Button } from '../../components/ui/button';
import { FormAlert } from '../../components/ui/form-alert';
import { LoadingState } from '../../components/ui/loading-state';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { useOutbox } from '../../features/admin-outbox/api/get-outbox';
import { OutboxList } from '../../features/admin-outbox/components/outbox-list';

export function AdminOutboxRoute() {
  const outbox = useOutbox();

  return (
    <>
      <title>Outbox · Blockwright</title>
      <PageHeading
        eyebrow="Admin"
        lead="The e-mails the built-in test mail server has kept, newest first."
      >
        Outbox
      </PageHeading>
      <Panel>
        <div className="mb-4 flex justify-end">
          <Button
            variant="secondary"
            className="px-3 py-1.5"
            pending={outbox.isFetching}
            pendingLabel="Checking…"
            onClick={() => void outbox.refetch()}
          >
            Check for new mail
          </Button>
        </div>
        {outbox.isPending ? (
          <LoadingState label="Opening the outbox…" />
        ) : outbox.isError ? (
          <FormAlert>{outbox.error.message}</FormAlert>
        ) : outbox.data === null ? (
          <p className="text-ink-700">
            This server sends real e-mail through its configured mail server, so it keeps no
            outbox to show.
          </p>
        ) : (
          <OutboxList messages={outbox.data} />
        )}
      </Panel>
    </>
  );
}
