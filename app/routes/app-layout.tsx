import { data, Form, NavLink, Outlet } from "react-router";
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

export default function AppLayout({ loaderData }: Route.ComponentProps) {
  const { person, role, organizationName, flash } = loaderData;
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="border-b border-ink-800 bg-ink-900 text-ink-100">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-5 py-3">
          <NavLink to="/" className="flex items-center gap-2 font-semibold text-white">
            <img src="/favicon.svg" alt="" className="h-7 w-7" />
            Isotrope
          </NavLink>
          <nav aria-label="Main" className="order-last -mx-2 flex w-full gap-1 overflow-x-auto sm:order-none sm:mx-0 sm:w-auto sm:flex-1">
            {(role ? sectionsFor(role) : []).map((s) => (
              <NavLink
                key={s.path}
                to={s.path}
                end
                className={({ isActive }) =>
                  `rounded-md px-3 py-1.5 text-sm ${isActive ? "bg-ink-800 text-white" : "text-ink-200 hover:bg-ink-800 hover:text-white"}`
                }
              >
                {s.label}
              </NavLink>
            ))}
          </nav>
          {person ? (
            <div className="ml-auto flex items-center gap-3 text-sm">
              <span className="hidden text-right leading-tight sm:block">
                <span className="block text-white">{person.name}</span>
                <span className="block text-xs text-ink-200">
                  {role ? `${roleLabels[role]} · ${organizationName}` : person.email}
                </span>
              </span>
              <Form method="post" action="/sign-out">
                <button type="submit" className="whitespace-nowrap rounded-md px-3 py-1.5 text-ink-200 ring-1 ring-ink-600 hover:bg-ink-800 hover:text-white">
                  Sign out
                </button>
              </Form>
            </div>
          ) : null}
        </div>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-5 py-8">
        <FlashMessage flash={flash} />
        <Outlet />
      </main>
    </div>
  );
}
