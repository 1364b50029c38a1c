import { data, Link, Outlet } from "react-router";
import { Wordmark } from "~/components/mark";
import { FlashMessage } from "~/components/panels";
import { takeFlash } from "~/infra/flash.server";
import type { Route } from "./+types/layout";

export async function loader({ request }: Route.LoaderArgs) {
  const { flash, headers } = await takeFlash(request);
  return data({ flash }, { headers });
}

// A sheet on survey-book paper: the card is ruled in ink and sits a little off the grid.
export default function AuthLayout({ loaderData }: Route.ComponentProps) {
  return (
    <div className="graph-paper flex min-h-screen flex-col items-center px-4 py-10 sm:py-16">
      <Link to="/" className="mb-6 px-1 py-1">
        <Wordmark size="lg" />
      </Link>
      <main className="w-full max-w-md rounded-sheet border border-ink-900 bg-sheet shadow-[5px_5px_0_var(--color-rule)]">
        <div className="p-6 sm:p-8">
          <FlashMessage flash={loaderData.flash} />
          <Outlet />
        </div>
        <p className="label-caps border-t border-rule px-6 py-2 sm:px-8">RF exposure compliance</p>
      </main>
      <p className="mt-8 max-w-md text-center text-sm text-graphite-600">
        Predictions are conservative estimates, not measurements; local codes and a licensed professional's judgement prevail.
      </p>
    </div>
  );
}
