// React Router's Node entry, with one addition: a nonce per HTML response, given to React Router's
// inline scripts and named in the page's Content-Security-Policy.
import { PassThrough, Writable } from "node:stream";
import { createReadableStreamFromReadable } from "@react-router/node";
import { renderToPipeableStream } from "react-dom/server";
import type { EntryContext, HandleErrorFunction, RouterContextProvider } from "react-router";
import { isRouteErrorResponse, ServerRouter } from "react-router";
import { contentSecurityPolicy, createNonce } from "~/infra/content-security-policy.server";

// Deferred data may take this long (the Exposure page computing a large site on a busy machine).
export const streamTimeout = 60_000;

// The background work (PDF rendering, e-mail), started by server/index.mjs unless WORKER=off.
export { startBackgroundWork, stopBackgroundWork } from "~/features/documents/worker.server";

// Logs what went wrong on the server. A request the router refused itself (a method a route does
// not take, an unknown path: answered 405 or 404) and a request the client abandoned are not
// faults, so they leave no stack trace in the log.
export const handleError: HandleErrorFunction = (error, { request }) => {
  if (request.signal.aborted) return;
  if (isRouteErrorResponse(error) && error.status < 500) return;
  console.error(error);
};

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

  // A page that defers data (the Exposure page while its result is computed) streams: the shell
  // first, the deferred parts as they resolve.
  if (hasDeferredData(routerContext)) return streamed(request, responseStatusCode, responseHeaders, routerContext, nonce);

  // Every other page's loaders have resolved before rendering starts, so the document is rendered whole and sent as one buffer with its length: one socket write instead
  // of one per React chunk, which was a tenth of a signed-in page's server time.
  return new Promise<Response>((resolve, reject) => {
    let shellRendered = false;
    const chunks: Buffer[] = [];
    const body = new Writable({
      write(chunk: Buffer, _encoding, callback) {
        chunks.push(chunk);
        callback();
      },
      final(callback) {
        clearTimeout(timeoutId);
        responseHeaders.set("Content-Type", "text/html; charset=utf-8");
        const html = Buffer.concat(chunks);
        responseHeaders.set("Content-Length", String(html.length));
        resolve(new Response(html, { headers: responseHeaders, status: responseStatusCode }));
        callback();
      },
    });
    const timeoutId = setTimeout(() => abort(), 6_000);

    const { pipe, abort } = renderToPipeableStream(<ServerRouter context={routerContext} url={request.url} nonce={nonce} />, {
      nonce,
      onAllReady() {
        shellRendered = true;
        pipe(body);
      },
      onShellError(error: unknown) {
        clearTimeout(timeoutId);
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

function hasDeferredData(context: EntryContext): boolean {
  const data = context.staticHandlerContext.loaderData ?? {};
  return Object.values(data).some((value) => value !== null && typeof value === "object" && Object.values(value).some((v) => v instanceof Promise));
}

function streamed(request: Request, status: number, headers: Headers, context: EntryContext, nonce: string) {
  return new Promise<Response>((resolve, reject) => {
    let shellRendered = false;
    const { pipe, abort } = renderToPipeableStream(<ServerRouter context={context} url={request.url} nonce={nonce} />, {
      nonce,
      onShellReady() {
        shellRendered = true;
        const body = new PassThrough();
        headers.set("Content-Type", "text/html; charset=utf-8");
        resolve(new Response(createReadableStreamFromReadable(body), { headers, status }));
        pipe(body);
      },
      onShellError(error: unknown) {
        reject(error);
      },
      onError(error: unknown) {
        status = 500;
        if (shellRendered) console.error(error);
      },
    });
    setTimeout(abort, streamTimeout + 1000);
  });
}
