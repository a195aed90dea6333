import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import type { LengthUnit } from '../../../../geometry/units';
import { formErrorsOf } from '../../../lib/form-errors';
import { useFabrics } from '../api/get-fabrics';
import { FabricCard } from './fabric-card';

/** The sewist's fabrics, by name. */
export function FabricsList({ unit }: { unit: LengthUnit }) {
  const fabrics = useFabrics();
  if (fabrics.isPending) return <LoadingState label="Loading your fabrics…" />;
  if (fabrics.isError) return <FormAlert>{formErrorsOf({}, fabrics.error).message}</FormAlert>;
  if (fabrics.data.length === 0)
    return <p className="text-ink-700">No fabrics yet. Add the cloth you are about to cut, with a quick stretch and wash test.</p>;
  return (
    <ul aria-label="Your fabrics" className="grid gap-4 md:grid-cols-2">
      {fabrics.data.map((fabric) => (
        <FabricCard key={fabric.id} fabric={fabric} unit={unit} />
      ))}
    </ul>
  );
}
