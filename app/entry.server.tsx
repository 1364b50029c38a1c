// React Router's Node entry, with one addition: a nonce per HTML response, given to React Router's
// inline scripts and named in the page's Content-Security-Policy.
import { PassThrough } from "node:stream";
import { createReadableStreamFromReadable } from "@react-router/node";
import { isbot } from "isbot";
import type { RenderToPipeableStreamOptions } from "react-dom/server";
import { renderToPipeableStream } from "react-dom/server";
import type { EntryContext, RouterContextProvider } from "react-router";
import { ServerRouter } from "react-router";
import { contentSecurityPolicy, createNonce } from "~/infra/content-security-policy.server";

export const streamTimeout = 5_000;

// The background work (PDF rendering, e-mail), started by server/index.mjs unless WORKER=off.
export { startBackgroundWork, stopBackgroundWork } from "~/features/documents/worker.server";

export default function handleRequest(
  request: Request,
  responseStatusCode: number,
  responseHeaders: Headers,
  routerContext: EntryContext,
  _loadContext: RouterContextProvider,
) {
  const nonce = createNonce();
  responseHeaders.set("Content-Security-Policy", contentSecurityPolicy(nonce, { dev: import.meta.env.DEV }));
  if (request.method.toUpperCase() === "HEAD") {
    return new Response(null, { status: responseStatusCode, headers: responseHeaders });
  }

  return new Promise<Response>((resolve, reject) => {
    let shellRendered = false;
    const userAgent = request.headers.get("user-agent");
    // Crawlers and SPA mode wait for all content; people get the shell as soon as it is ready.
    const readyOption: keyof RenderToPipeableStreamOptions =
      (userAgent && isbot(userAgent)) || routerContext.isSpaMode ? "onAllReady" : "onShellReady";
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(() => abort(), streamTimeout + 1000);

    const { pipe, abort } = renderToPipeableStream(<ServerRouter context={routerContext} url={request.url} nonce={nonce} />, {
      nonce,
      [readyOption]() {
        shellRendered = true;
        const body = new PassThrough({
          final(callback) {
            clearTimeout(timeoutId);
            timeoutId = undefined;
            callback();
          },
        });
        responseHeaders.set("Content-Type", "text/html");
        pipe(body);
        resolve(new Response(createReadableStreamFromReadable(body), { headers: responseHeaders, status: responseStatusCode }));
      },
      onShellError(error: unknown) {
        reject(error);
      },
      onError(error: unknown) {
        responseStatusCode = 500;
        // Errors inside the shell are logged here; shell errors reject and are logged by React Router.
        if (shellRendered) console.error(error);
      },
    });
  });
}
