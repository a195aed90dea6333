import { Link } from 'react-router-dom';
import { PageHeading } from '../../components/ui/page-heading';
import { useMe } from '../../features/auth/api/get-me';
import { areasFor, type Area } from '../navigation';

function AreaCard({ area }: { area: Area }) {
  return (
    <li>
      <Link
        to={area.to}
        className="group flex h-full flex-col rounded-lg border border-calico-300 bg-calico-50 p-5 transition-colors hover:border-denim-600"
      >
        <span className="flex items-baseline justify-between gap-3">
          <span className="font-display text-xl font-semibold text-ink-900 group-hover:text-denim-700">
            {area.label}
          </span>
          {!area.built && (
            <span className="rounded-sm border border-dashed border-chalk-600 px-1.5 text-[0.7rem] font-semibold uppercase tracking-wider text-chalk-700">
              Coming
            </span>
          )}
        </span>
        <span className="mt-2 text-sm text-ink-700">{area.summary}</span>
      </Link>
    </li>
  );
}

export function DashboardRoute() {
  const { data: user } = useMe();
  if (!user) return null;
  const visible = areasFor(user.role);

  return (
    <>
      <title>Home · Blockwright</title>
      <PageHeading
        eyebrow="Your table"
        lead="Here is what Blockwright has for you. Areas marked “coming” are planned and not built yet."
      >
        Hello, {user.displayName}
      </PageHeading>
      <ul className="grid gap-4 sm:grid-cols-2">
        {visible.map((area) => (
          <AreaCard key={area.id} area={area} />
        ))}
      </ul>
    </>
  );
}
