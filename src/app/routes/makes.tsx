import { useEffect, useRef, useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { FormAlert } from '../../components/ui/form-alert';
import { LoadingState } from '../../components/ui/loading-state';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useMake } from '../../features/makes/api/get-make';
import { usePatternChoices } from '../../features/makes/api/get-pattern-choices';
import { hasBlend, type MakeDetail, type MakeSummary } from '../../features/makes/api/schemas';
import { MakesList, type MakesView } from '../../features/makes/components/makes-list';
import { NewMakeForm } from '../../features/makes/components/new-make-form';
import { PrintPanel } from '../../features/prints/components/print-panel';
import { formErrorsOf } from '../../lib/form-errors';
import type { User } from '../../types/api';

/** The print options for one make, with the sizes its pattern carries. */
function MakePrint({ make, units }: { make: MakeSummary; units: User['units'] }) {
  const detail = useMake(make.id);
  const mine = usePatternChoices('mine');
  const library = usePatternChoices('library');
  if (detail.isError) return <FormAlert>{formErrorsOf({}, detail.error).message}</FormAlert>;
  if (detail.isPending || mine.isPending || library.isPending) return <LoadingState label="Loading the make…" />;
  const pattern = [...(mine.data ?? []), ...(library.data ?? [])].find((each) => each.id === make.pattern.id);
  return (
    <PrintPanel
      makeId={make.id}
      makeName={detail.data.name}
      units={units}
      sizes={pattern?.sizes ?? []}
      blended={hasBlend(detail.data)}
    />
  );
}

function PrintDialog({
  make,
  units,
  onClose,
}: {
  make: MakeSummary;
  units: User['units'];
  onClose: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby="print-dialog-title"
      onClose={onClose}
      className="m-auto w-[min(52rem,calc(100vw-2rem))] max-h-[calc(100dvh-2rem)] rounded-lg border border-calico-300 bg-calico-50 p-6 text-ink-900 shadow-xl backdrop:bg-ink-900/40"
    >
      <div className="mb-5 flex items-start justify-between gap-4">
        <div>
          <p className="text-xs font-semibold uppercase tracking-[0.16em] text-chalk-700">Print</p>
          <h2 id="print-dialog-title" className="text-2xl font-semibold">
            {make.name}
          </h2>
          <p className="mt-1 text-sm text-ink-500">The newest revision, with every alteration that is switched on.</p>
        </div>
        <Button variant="secondary" className="px-3 py-1.5" onClick={() => ref.current?.close()}>
          Close
        </Button>
      </div>
      <MakePrint make={make} units={units} />
    </dialog>
  );
}

export function MakesRoute() {
  const { data: user } = useMe();
  const navigate = useNavigate();
  const [searchParams, setSearchParams] = useSearchParams();
  const [created, setCreated] = useState<MakeDetail | null>(null);
  const [printing, setPrinting] = useState<MakeSummary | null>(null);
  if (!user) return null;

  const view: MakesView = searchParams.get('show') === 'archived' ? 'archived' : 'active';
  const newFromPattern = searchParams.get('new');
  const formOpen = newFromPattern !== null;

  const setParams = (next: { view?: MakesView; newFromPattern?: string | null }) =>
    setSearchParams(
      (current) => {
        const params = new URLSearchParams(current);
        if (next.view !== undefined) {
          if (next.view === 'archived') params.set('show', 'archived');
          else params.delete('show');
        }
        if (next.newFromPattern !== undefined) {
          if (next.newFromPattern === null) params.delete('new');
          else params.set('new', next.newFromPattern);
        }
        return params;
      },
      { replace: true },
    );

  return (
    <>
      <title>Makes · Blockwright</title>
      <PageHeading
        eyebrow="Your work"
        lead="Each make is one garment: a pattern, your measurements, the cloth, and every round of alterations."
      >
        Makes
      </PageHeading>

      <FormAlert tone="success" className="mb-6 empty:hidden">
        {created && (
          <>
            “{created.name}” is started.{' '}
            <TextLink to={paths.make.build(created.id)}>Open it to alter the pieces</TextLink>
          </>
        )}
      </FormAlert>

      {formOpen ? (
        <Panel title="New make" className="mb-8 max-w-2xl">
          <NewMakeForm
            key={newFromPattern}
            units={user.units}
            initialPatternId={newFromPattern || undefined}
            onCreated={(make) => {
              setCreated(make);
              setParams({ newFromPattern: null, view: 'active' });
            }}
            onCancel={() => setParams({ newFromPattern: null })}
          />
        </Panel>
      ) : (
        <div className="mb-6">
          <Button
            onClick={() => {
              setCreated(null);
              setParams({ newFromPattern: '' });
            }}
          >
            New make
          </Button>
        </div>
      )}

      <MakesList
        view={view}
        onViewChange={(next) => setParams({ view: next })}
        onPrint={setPrinting}
        onSewnAgain={(make) => navigate(paths.make.build(make.id))}
      />

      {printing && <PrintDialog key={printing.id} make={printing} units={user.units} onClose={() => setPrinting(null)} />}
    </>
  );
}
