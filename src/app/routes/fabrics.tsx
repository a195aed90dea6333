import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { FormAlert } from '../../components/ui/form-alert';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { useMe } from '../../features/auth/api/get-me';
import { FabricsList } from '../../features/fabrics/components/fabrics-list';
import { NewFabricForm } from '../../features/fabrics/components/new-fabric-form';

/** Fabrics: the sewist's cloths with their stretch, weight, width and shrinkage (`?new` opens the form). */
export function FabricsRoute() {
  const { data: user } = useMe();
  const [searchParams, setSearchParams] = useSearchParams();
  const [created, setCreated] = useState<string | null>(null);
  if (!user) return null;
  const creating = searchParams.has('new');

  return (
    <>
      <title>Fabrics · Blockwright</title>
      <PageHeading
        eyebrow="Your work"
        lead="The cloth changes the plan: stretch across lets a garment sit closer, and cloth that shrinks in the wash needs pre-washing or larger pieces. Record each cloth once; a make’s plan reads it."
      >
        Fabrics
      </PageHeading>

      <FormAlert tone="success" className="mb-6 empty:hidden">
        {created && `“${created}” is saved.`}
      </FormAlert>

      {creating ? (
        <Panel title="New fabric" className="mb-8 max-w-4xl">
          <NewFabricForm
            unit={user.units}
            onCreated={(fabric) => {
              setCreated(fabric.name);
              setSearchParams({}, { replace: true });
            }}
            onCancel={() => setSearchParams({}, { replace: true })}
          />
        </Panel>
      ) : (
        <div className="mb-6">
          <Button
            onClick={() => {
              setCreated(null);
              setSearchParams({ new: '' }, { replace: true });
            }}
          >
            New fabric
          </Button>
        </div>
      )}

      <FabricsList unit={user.units} />
    </>
  );
}
