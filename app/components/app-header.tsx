import { Form, NavLink } from "react-router";
import { NAV_ITEMS } from "#app/lib/navigation.ts";
import { hasRole, type Role } from "#app/lib/roles.ts";

export interface HeaderUser {
  displayName: string;
  email: string;
  roles: Role[];
}

export function AppHeader({ user }: { user: HeaderUser | null }) {
  const items = user ? NAV_ITEMS.filter((item) => item.roles.length === 0 || hasRole(user.roles, item.roles)) : [];
  return (
    <header className="border-b border-rule bg-white">
      <div className="mx-auto flex max-w-6xl items-center gap-8 px-6 py-3">
        <a href="/" className="flex items-center gap-2 text-lg font-semibold tracking-tight">
          <img src="/favicon.svg" alt="" className="h-7 w-7" />
          Betasift
        </a>
        <nav aria-label="Main" className="flex flex-1 gap-1">
          {items.map((item) => (
            <NavLink
              key={item.path}
              to={item.path}
              end={item.path === "/"}
              className={({ isActive }) =>
                `rounded px-3 py-1.5 text-sm ${isActive ? "bg-signal-soft font-medium text-signal" : "text-ink hover:bg-paper"}`
              }
            >
              {item.label}
            </NavLink>
          ))}
        </nav>
        {user ? (
          <div className="flex items-center gap-3 text-sm">
            <span title={user.email}>{user.displayName}</span>
            <Form method="post" action="/sign-out">
              <button type="submit" className="rounded border border-rule px-3 py-1.5 hover:bg-paper">
                Sign out
              </button>
            </Form>
          </div>
        ) : null}
      </div>
    </header>
  );
}
