import { PassThrough } from "node:stream";
import type { EntryContext } from "react-router";
import { createReadableStreamFromReadable } from "@react-router/node";
import { ServerRouter } from "react-router";
import { isbot } from "isbot";
import { renderToPipeableStream, type RenderToPipeableStreamOptions } from "react-dom/server";
import { bootServices } from "./utils/boot.server";

// Migrations, the mail sender and (in development and demo) the fake SMTP server start with the app.
void bootServices().catch((error) => {
  console.error("Takeline could not start its services:", error);
  process.exit(1);
});

export const streamTimeout = 5_000;

/** Logs server errors without ever sending their details to the browser. */
export function handleError(error: unknown, { request }: { request: Request }) {
  if (request.signal.aborted) return;
  console.error(error);
}

export default function handleRequest(request: Request, status: number, headers: Headers, routerContext: EntryContext) {
  if (request.method.toUpperCase() === "HEAD") return new Response(null, { status, headers });
  return new Promise<Response>((resolve, reject) => {
    const userAgent = request.headers.get("user-agent");
    const readyOption: keyof RenderToPipeableStreamOptions = (userAgent && isbot(userAgent)) || routerContext.isSpaMode ? "onAllReady" : "onShellReady";
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(() => abort(), streamTimeout + 1000);
    const { pipe, abort } = renderToPipeableStream(<ServerRouter context={routerContext} url={request.url} />, {
      [readyOption]() {
        const body = new PassThrough({
          final(callback) {
            clearTimeout(timeoutId);
            timeoutId = undefined;
            callback();
          },
        });
        headers.set("Content-Type", "text/html");
        pipe(body);
        resolve(new Response(createReadableStreamFromReadable(body), { headers, status }));
      },
      onShellError: reject,
      onError(error: unknown) {
        status = 500;
        console.error(error);
      },
    });
  });
}
