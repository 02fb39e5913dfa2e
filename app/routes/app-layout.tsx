// The frame of every signed-in page: skip link, header with navigation and sign-out, main area.
import { Link, NavLink, Outlet } from 'react-router';
import { SignOutButton } from '../features/auth/components/sign-out-button';
import { useSignedInUser } from '../features/auth/hooks/use-signed-in-user';
import { cn } from '../utils/cn';
import { Wordmark } from '../components/wordmark';

const navClasses = ({ isActive }: { isActive: boolean }) =>
  cn(
    'rounded-md px-3 py-1.5 text-sm font-semibold',
    isActive ? 'bg-accent-50 text-accent-800' : 'text-stone-700 hover:bg-stone-100',
  );

export function AppLayout() {
  const user = useSignedInUser();
  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50 focus:rounded-md focus:bg-white focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="border-b border-stone-200 bg-white/90">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
          <Link to="/" className="rounded-md" aria-label="Lobewright, all projects">
            <Wordmark />
          </Link>
          <nav aria-label="Main" className="flex gap-1">
            <NavLink to="/" end className={navClasses}>
              Projects
            </NavLink>
            {user.isAdmin && (
              <NavLink to="/admin" className={navClasses}>
                Site settings
              </NavLink>
            )}
          </nav>
          <div className="ml-auto flex items-center gap-3 text-sm">
            <span className="text-stone-700">
              <span className="sr-only">Signed in as </span>
              <span className="font-semibold text-stone-900">{user.name}</span>
            </span>
            <NavLink to="/account" className={navClasses}>
              Account
            </NavLink>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto max-w-6xl px-4 py-8 outline-none sm:px-6">
        <Outlet />
      </main>
    </div>
  );
}
