import { useSearchParams } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { PageHeading } from '../../components/ui/page-heading';
import { Panel } from '../../components/ui/panel';
import { useMe } from '../../features/auth/api/get-me';
import { useProfiles } from '../../features/profiles/api/get-profiles';
import { NewProfileForm } from '../../features/profiles/components/new-profile-form';
import { ProfileDetail } from '../../features/profiles/components/profile-detail';
import { ProfilesList } from '../../features/profiles/components/profiles-list';

/** Fit planner: measurement profiles, each a history of dated sets (`?profile=<id>`, `?new`). */
export function FitPlannerRoute() {
  const { data: user } = useMe();
  const profiles = useProfiles();
  const [searchParams, setSearchParams] = useSearchParams();
  if (!user) return null;

  const creating = searchParams.has('new');
  const chosen = searchParams.get('profile');
  // With nothing chosen, open the first profile so the page is never empty when there are some.
  const selectedId = creating ? null : (chosen ?? profiles.data?.[0]?.id ?? null);
  const show = (params: Record<string, string>) => setSearchParams(params, { replace: true });

  return (
    <>
      <title>Fit planner · Blockwright</title>
      <PageHeading
        eyebrow="Your work"
        lead="Measurement profiles for you and the people you sew for. Each time you measure again, the new numbers are kept as a dated set beside the old ones, so you can see what changed. A make’s workspace plans the fit from the profile you give it."
      >
        Fit planner
      </PageHeading>
      <div className="grid items-start gap-6 lg:grid-cols-[18rem_minmax(0,1fr)]">
        <Panel title="Profiles">
          <div className="flex flex-col gap-4">
            <ProfilesList selectedId={selectedId} onSelect={(id) => show({ profile: id })} />
            {!creating && (
              <div>
                <Button onClick={() => show({ new: '' })}>New profile</Button>
              </div>
            )}
          </div>
        </Panel>
        <Panel>
          {creating ? (
            <>
              <h2 className="mb-4 font-display text-2xl font-semibold">New profile</h2>
              <NewProfileForm
                unit={user.units}
                onCreated={(profile) => show({ profile: profile.id })}
                onCancel={() => show({})}
              />
            </>
          ) : selectedId ? (
            <ProfileDetail key={selectedId} id={selectedId} unit={user.units} onDeleted={() => show({})} />
          ) : (
            <p className="text-ink-700">Choose “New profile” to record a first set of measurements.</p>
          )}
        </Panel>
      </div>
    </>
  );
}
