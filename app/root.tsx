import { data, isRouteErrorResponse, Links, Meta, Outlet, Scripts, ScrollRestoration, useRouteLoaderData } from "react-router";
import type { Route } from "./+types/root";
import { AppHeader } from "./components/app-header";
import { ErrorPage } from "./components/error-page";
import { Toast } from "./components/ui/toast";
import { getOptionalUser } from "./utils/permissions.server";
import { getSession, sessionStorage } from "./utils/session.server";
import { isDevOrDemo } from "./utils/env.server";
import "./app.css";

export async function loader({ request }: Route.LoaderArgs) {
  const user = (await getOptionalUser(request)) ?? null;
  const session = await getSession(request);
  const toast = session.get("toast") ?? null;
  const headers = toast ? { "Set-Cookie": await sessionStorage().commitSession(session) } : undefined;
  return data({ user, toast, showDevMail: isDevOrDemo() }, { headers });
}

export function meta() {
  return [{ title: "Takeline" }, { name: "description", content: "Land take of road and rail alignment alternatives" }];
}

export function Layout({ children }: { children: React.ReactNode }) {
  const root = useRouteLoaderData<typeof loader>("root");
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <link rel="icon" href="/favicon.svg" type="image/svg+xml" />
        <Meta />
        <Links />
      </head>
      <body className="min-h-screen">
        <AppHeader user={root?.user ?? null} showDevMail={root?.showDevMail ?? false} />
        <main className="mx-auto max-w-6xl px-4 py-8">{children}</main>
        <Toast toast={root?.toast ?? null} />
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  if (isRouteErrorResponse(error)) return <ErrorPage status={error.status} data={error.data} />;
  return <ErrorPage status={500} data={null} />;
}
