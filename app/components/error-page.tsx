import { ROLE_LABELS, isRole } from "~/utils/roles";
import { Card } from "./ui/card";

function neededRoles(data: unknown): string[] {
  if (!data || typeof data !== "object" || !("neededRoles" in data) || !Array.isArray(data.neededRoles)) return [];
  return data.neededRoles.filter(isRole).map((r) => ROLE_LABELS[r]);
}

/** The page for 403, 404 and unexpected errors. It never shows a stack trace. */
export function ErrorPage({ status, data }: { status: number; data: unknown }) {
  if (status === 403) {
    const roles = neededRoles(data);
    return (
      <Card title="You may not open this page">
        <p data-testid="forbidden">
          This page needs the <strong>{roles.join(" or ") || "right"}</strong> role
          {roles.length > 1 ? "s" : ""}. Ask an administrator if you need it for your work.
        </p>
        <p className="mt-4">
          <a href="/">Go to your home page</a>
        </p>
      </Card>
    );
  }
  if (status === 404) {
    return (
      <Card title="Not found">
        <p>There is nothing at this address, or you are not a member of the project it belongs to.</p>
        <p className="mt-4">
          <a href="/">Go to your home page</a>
        </p>
      </Card>
    );
  }
  const message = data && typeof data === "object" && "error" in data && typeof data.error === "string" ? data.error : null;
  if (message && status < 500) {
    return (
      <Card title="The request was refused">
        <p role="alert">{message}</p>
      </Card>
    );
  }
  return (
    <Card title="Something went wrong">
      <p>The server could not finish this request. Nothing was changed. Try again, and tell an administrator if it happens again.</p>
    </Card>
  );
}
