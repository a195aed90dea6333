import { Button } from '../../../components/ui/button';
import { roleLabels } from '../../../types/api';
import type { DemoAccount } from '../api/get-meta';

/**
 * The seeded demo accounts with their passwords. The server sends them only in
 * development, so this list never appears on a real installation.
 */
export function DemoAccounts({
  accounts,
  onPick,
}: {
  accounts: DemoAccount[];
  onPick: (account: DemoAccount) => void;
}) {
  return (
    <section
      aria-labelledby="demo-accounts-heading"
      className="rounded-lg border border-dashed border-tape-400 bg-tape-100/60 p-5"
    >
      <h2 id="demo-accounts-heading" className="text-lg font-semibold">
        Demo accounts
      </h2>
      <p className="mt-1 text-sm text-ink-700">
        This server runs in development mode, so it lists its invented demo people. Pick one to
        fill in the form.
      </p>
      <ul className="mt-4 flex flex-col gap-2">
        {accounts.map((account) => (
          <li
            key={account.email}
            className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-3 rounded-md bg-calico-50 px-3 py-2.5"
          >
            <div>
              <p className="font-semibold">
                {account.displayName}{' '}
                <span className="ml-1 rounded-sm bg-denim-50 px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide text-denim-700">
                  {roleLabels[account.role]}
                </span>
              </p>
              <p className="text-sm text-ink-500">{account.about}</p>
              <p className="mt-0.5 font-mono text-xs break-all text-ink-700">
                {account.email} · {account.password}
              </p>
            </div>
            <Button
              variant="secondary"
              className="px-3 py-1.5"
              onClick={() => onPick(account)}
              aria-label={`Use ${account.displayName}'s account`}
            >
              Use
            </Button>
          </li>
        ))}
      </ul>
    </section>
  );
}
