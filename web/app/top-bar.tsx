import { Link, NavLink, useNavigate } from 'react-router-dom';
import { ROLE_LABELS } from '#shared/schemas/roles';
import { useSignOut } from '../features/auth/api/auth-mutations';
import { useCurrentUser } from '../features/auth/api/use-current-user';
import { Button } from '../components/ui/button';
import { useToast } from '../components/ui/use-toast';
import { navItemsFor } from './nav-items';
import { paths } from './paths';

export function TopBar() {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const signOut = useSignOut(() => navigate(paths.signIn, { replace: true }));
  const toast = useToast();

  function leave() {
    signOut.mutate(undefined, {
      onError: (err) => toast.show(`Signing out failed: ${err.message}`, 'danger'),
    });
  }

  return (
    <header className="border-b border-rule bg-sheet">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-8 gap-y-2 px-6 py-3">
        <Link to={paths.engagements} className="font-serif text-xl font-bold text-ink no-underline">
          Sojourn
        </Link>
        <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto sm:flex-1">
          <ul className="flex flex-wrap gap-1">
            {navItemsFor(user.role).map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.to === paths.engagements ? false : undefined}
                  className={({ isActive }) =>
                    `block rounded-md px-3 py-1.5 text-sm no-underline ${isActive ? 'bg-accent-tint font-semibold text-accent-strong' : 'text-ink-soft hover:bg-quiet-tint hover:text-ink'}`
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="ml-auto flex items-center gap-4">
          <p className="text-right text-sm leading-tight">
            <span className="block font-medium text-ink" data-testid="current-user-name">
              {user.name}
            </span>
            <span className="block text-xs text-ink-faint" data-testid="current-user-role">
              {ROLE_LABELS[user.role]}
            </span>
          </p>
          <Button size="sm" variant="secondary" onClick={leave} busy={signOut.isPending}>
            Sign out
          </Button>
        </div>
      </div>
    </header>
  );
}
