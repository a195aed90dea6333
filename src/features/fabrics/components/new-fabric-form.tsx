import { useState } from 'react';
import type { LengthUnit } from '../../../../geometry/units';
import { useCreateFabric } from '../api/create-fabric';
import type { Fabric } from '../api/schemas';
import { fabricDraft } from '../model';
import { FabricForm } from './fabric-form';

export function NewFabricForm({ unit, onCreated, onCancel }: { unit: LengthUnit; onCreated: (fabric: Fabric) => void; onCancel: () => void }) {
  const create = useCreateFabric({ onSuccess: onCreated });
  const [initialDraft] = useState(() => fabricDraft('', {}, unit));
  return (
    <FabricForm
      unit={unit}
      initialDraft={initialDraft}
      save={(value, { onError }) => create.mutate(value, { onError })}
      pending={create.isPending}
      serverError={create.error}
      submitLabel="Save the fabric"
      onCancel={onCancel}
    />
  );
}
