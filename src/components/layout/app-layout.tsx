import { NavLink, Navigate, Outlet, useLocation } from 'react-router-dom';
import type { User } from '@shared/schemas/auth';
import { navFor } from '@/app/nav';
import { useMe } from '@/features/auth/api/get-me';
import { useLogout } from '@/features/auth/api/logout';
import { Button } from '@/components/ui/button';

function Brand() {
  return (
    <span className="flex items-center gap-2 text-lg font-semibold tracking-tight text-white">
      <svg aria-hidden viewBox="0 0 32 32" className="h-6 w-6">
        <rect width="32" height="32" rx="7" fill="#ffffff" fillOpacity=".14" />
        <path d="M18 4 9 18h6l-2 10 10-15h-6z" fill="#fff" />
      </svg>
      Arcwise
    </span>
  );
}

function TopBar({ user }: { user: User }) {
  const logout = useLogout();
  return (
    <header className="no-print bg-accent-strong">
      <div className="mx-auto flex max-w-[1400px] flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2">
        <Brand />
        <nav aria-label="Main" className="flex flex-wrap gap-1">
          {navFor(user.role).map((item) => (
            <NavLink
              key={item.to}
              to={item.to}
              className={({ isActive }) =>
                `rounded-md px-3 py-1.5 text-[15px] font-medium ${isActive ? 'bg-white text-accent-strong' : 'text-white/85 hover:bg-white/10 hover:text-white'}`
              }
            >
              {item.label}
            </NavLink>
          ))}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm text-white/85">
          <span>
            {user.name} · <span className="font-medium text-white">{user.role}</span>
          </span>
          <Button variant="secondary" className="!py-1" onClick={() => logout.mutate()}>
            Sign out
          </Button>
        </div>
      </div>
    </header>
  );
}

/** The signed-in shell: a 401 anywhere sends the user to sign-in and back to where they were. */
export function AppLayout() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) return <p className="p-8 text-ink-soft">Loading…</p>;
  if (!me.data) {
    const next = encodeURIComponent(location.pathname + location.search);
    return <Navigate to={`/sign-in?next=${next}`} replace />;
  }
  return (
    <div className="min-h-screen">
      <TopBar user={me.data} />
      <main className="mx-auto max-w-[1400px] px-4 py-5">
        <Outlet context={me.data} />
      </main>
    </div>
  );
}
