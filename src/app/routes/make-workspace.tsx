import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useParams } from 'react-router-dom';
import { LoadingState } from '../../components/ui/loading-state';
import { PageHeading } from '../../components/ui/page-heading';
import { TextLink } from '../../components/ui/text-link';
import { FormAlert } from '../../components/ui/form-alert';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { makeKeys } from '../../features/makes/query-keys';
import { PrintPanel } from '../../features/prints/components/print-panel';
import { useWorkspaceMake } from '../../features/workspace/api/get-make';
import { workspacePatternQueryOptions } from '../../features/workspace/api/get-pattern';
import { MakeWorkspace } from '../../features/workspace/components/make-workspace';

/** One make's workspace: the make and its pattern, drawn and altered; printing from the same page. */
export function Component() {
  const { id = '' } = useParams();
  const { data: user } = useMe();
  const make = useWorkspaceMake(id);
  const pattern = useQuery({ ...workspacePatternQueryOptions(make.data?.pattern.id ?? ''), enabled: !!make.data });
  const unit = user?.units ?? 'in';
  const queryClient = useQueryClient();
  // The makes list shows each make's alteration count and when it was last saved.
  const onSaved = useCallback(() => void queryClient.invalidateQueries({ queryKey: makeKeys.all }), [queryClient]);
  const error = make.error ?? pattern.error;

  return (
    <>
      <title>{`${make.data?.name ?? 'Make'} · Blockwright`}</title>
      <PageHeading eyebrow={make.data ? `Make · ${make.data.pattern.name}` : 'Make'}>{make.data?.name ?? 'Make'}</PageHeading>
      <p className="-mt-4 mb-4 text-sm">
        <TextLink to={paths.makes.build()}>Back to your makes</TextLink>
        {make.data?.fabricNote ? <span className="ml-3 text-ink-700">Fabric: {make.data.fabricNote}</span> : null}
      </p>
      {error ? (
        <FormAlert>{error.message}</FormAlert>
      ) : !make.data || !pattern.data ? (
        <LoadingState />
      ) : (
        <MakeWorkspace
          key={make.data.id}
          make={make.data}
          pattern={pattern.data}
          unit={unit}
          onSaved={onSaved}
          printPanel={<PrintPanel makeId={make.data.id} makeName={make.data.name} units={unit} sizes={pattern.data.sizes} blended={make.data.revision.alterations.some((a) => a.op.op === 'blend' && a.enabled !== false)} />}
        />
      )}
    </>
  );
}
