import { data, Form, NavLink, Outlet } from "react-router";
import { buttonClass, ButtonLink } from "~/components/button";
import { Wordmark } from "~/components/mark";
import { FlashMessage } from "~/components/panels";
import { takeFlash } from "~/infra/flash.server";
import { getMembership, getSignedIn } from "~/features/auth/guard.server";
import { roleLabels, sectionsFor } from "~/lib/roles";
import type { Route } from "./+types/app-layout";

// The shell only reads who is signed in (the same lookup the page's guard uses); each page below runs its own guard.
export async function loader(args: Route.LoaderArgs) {
  const [signedIn, membership] = await Promise.all([getSignedIn(args), getMembership(args)]);
  const { flash, headers } = await takeFlash(args.request);
  return data(
    {
      flash,
      person: signedIn ? { name: signedIn.user.name, email: signedIn.user.email } : null,
      role: membership?.role ?? null,
      organizationName: membership?.organizationName ?? null,
    },
    { headers },
  );
}

// Links sit inside a scrolling strip on narrow screens, so their focus ring is drawn inside them.
const navLink = ({ isActive }: { isActive: boolean }) =>
  `block whitespace-nowrap px-3 py-3 text-sm focus-visible:outline-offset-[-4px] ${
    isActive ? "font-bold text-ink-900 shadow-[inset_0_-3px_0_var(--color-flag-600)]" : "text-graphite-600 hover:text-ink-900 hover:shadow-[inset_0_-3px_0_var(--color-rule)]"
  }`;

export default function AppLayout({ loaderData }: Route.ComponentProps) {
  const { person, role, organizationName, flash } = loaderData;
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-10 focus:bg-sheet focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-ink-900 bg-sheet">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 px-5">
          <NavLink to="/" className="-mx-1 my-2 px-1 py-1" aria-label="Isotrope, overview">
            <Wordmark />
          </NavLink>
          <nav aria-label="Main" className="scroll-hint order-last -mx-3 w-[calc(100%+1.5rem)] overflow-x-auto border-t border-rule sm:order-none sm:mx-0 sm:w-auto sm:flex-1 sm:border-t-0">
            <ul className="flex">
              {(role ? sectionsFor(role) : []).map((s) => (
                <li key={s.path}>
                  <NavLink to={s.path} end className={navLink}>
                    {s.label}
                  </NavLink>
                </li>
              ))}
            </ul>
          </nav>
          <div className="ml-auto flex items-center gap-3 py-2 text-sm">
            {person ? (
              <>
                <span className="hidden max-w-80 text-right leading-tight sm:block">
                  <span className="block truncate font-medium text-ink-900">{person.name}</span>
                  <span className="block truncate text-xs text-graphite-600">{role ? `${roleLabels[role]} · ${organizationName}` : person.email}</span>
                </span>
                <Form method="post" action="/sign-out">
                  <button type="submit" className={buttonClass("secondary", "whitespace-nowrap", "sm")}>
                    Sign out
                  </button>
                </Form>
              </>
            ) : (
              <ButtonLink to="/sign-in" size="sm">
                Sign in
              </ButtonLink>
            )}
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-5 py-8">
        <FlashMessage flash={flash} />
        <Outlet />
      </main>
    </div>
  );
}
