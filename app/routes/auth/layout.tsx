import { data, Link, Outlet } from "react-router";
import { FlashMessage } from "~/components/panels";
import { takeFlash } from "~/infra/flash.server";
import type { Route } from "./+types/layout";

export async function loader({ request }: Route.LoaderArgs) {
  const { flash, headers } = await takeFlash(request);
  return data({ flash }, { headers });
}

export default function AuthLayout({ loaderData }: Route.ComponentProps) {
  return (
    <div className="flex min-h-screen flex-col items-center bg-ink-50 px-4 py-12">
      <Link to="/" className="mb-8 flex items-center gap-2 text-lg font-semibold text-ink-900">
        <img src="/favicon.svg" alt="" className="h-8 w-8" />
        Isotrope
      </Link>
      <main className="w-full max-w-md rounded-card border border-ink-200 bg-white p-7 shadow-sm">
        <FlashMessage flash={loaderData.flash} />
        <Outlet />
      </main>
      <p className="mt-8 max-w-md text-center text-xs text-ink-600">
        RF exposure compliance for transmitter sites. Predictions are conservative estimates, not measurements; local codes and a
        licensed professional's judgement prevail.
      </p>
    </div>
  );
}
