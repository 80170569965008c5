import { Form, NavLink, useLocation } from "react-router";
import { NAV_ITEMS } from "#app/lib/navigation.ts";
import { hasRole, type Role } from "#app/lib/roles.ts";

export interface HeaderUser {
  displayName: string;
  email: string;
  roles: Role[];
}

const linkLook = ({ isActive }: { isActive: boolean }) =>
  `block rounded px-3 py-1.5 text-sm ${isActive ? "bg-signal-soft font-medium text-signal" : "text-ink hover:bg-paper"}`;

function SignOut({ wide }: { wide?: boolean }) {
  return (
    <Form method="post" action="/sign-out">
      <button type="submit" className={`rounded border border-rule px-3 py-1.5 text-sm hover:bg-paper ${wide ? "w-full text-left" : ""}`}>
        Sign out
      </button>
    </Form>
  );
}

// On wide screens the areas sit in a row; below 768 px they fold into a menu (a native disclosure, so it opens by
// keyboard and without JavaScript). Navigating closes it: the key on the disclosure changes with the path.
export function AppHeader({ user }: { user: HeaderUser | null }) {
  const location = useLocation();
  const items = user ? NAV_ITEMS.filter((item) => item.roles.length === 0 || hasRole(user.roles, item.roles)) : [];
  const links = items.map((item) => (
    <NavLink key={item.path} to={item.path} end={item.path === "/"} className={linkLook}>
      {item.label}
    </NavLink>
  ));
  return (
    <header className="border-b border-rule bg-white">
      <div className="mx-auto flex max-w-6xl items-center gap-6 px-4 py-3 sm:px-6">
        <a href="/" className="flex items-center gap-2 text-lg font-semibold tracking-tight">
          <img src="/favicon.svg" alt="" className="h-7 w-7" />
          Betasift
        </a>
        {user ? (
          <>
            <nav aria-label="Main" className="hidden flex-1 gap-1 md:flex">
              {links}
            </nav>
            <div className="hidden items-center gap-3 text-sm md:flex">
              <span title={user.email}>{user.displayName}</span>
              <SignOut />
            </div>
            <details key={location.pathname} className="relative ml-auto md:hidden">
              <summary className="flex cursor-pointer list-none items-center gap-2 rounded border border-rule px-3 py-1.5 text-sm [&::-webkit-details-marker]:hidden">
                <svg width="14" height="12" viewBox="0 0 14 12" aria-hidden="true">
                  <path d="M0 1h14M0 6h14M0 11h14" stroke="currentColor" strokeWidth="1.5" />
                </svg>
                Menu
              </summary>
              <div className="absolute right-0 z-20 mt-2 w-60 rounded border border-rule bg-white p-2 shadow-md">
                <nav aria-label="Main, in the menu" className="flex flex-col gap-0.5">
                  {links}
                </nav>
                <div className="mt-2 border-t border-rule pt-2 text-sm">
                  <p className="truncate px-3 pb-2 text-ink/75" title={user.email}>
                    {user.displayName}
                  </p>
                  <SignOut wide />
                </div>
              </div>
            </details>
          </>
        ) : null}
      </div>
    </header>
  );
}
