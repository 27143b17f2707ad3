import { Form, NavLink } from "react-router";
import type { PublicUser } from "~/models/users.server";
import { mayOpen, type Area } from "~/utils/access";
import { ROLE_LABELS } from "~/utils/roles";
import { BrandMark } from "./brand-mark";
import { Badge } from "./ui/badge";

const NAV: { to: string; label: string; area: Area }[] = [
  { to: "/projects", label: "Projects", area: "projects" },
  { to: "/decisions", label: "Decisions", area: "decisions" },
  { to: "/work", label: "My parcels", area: "workList" },
  { to: "/calculator", label: "Curve calculator", area: "calculator" },
  { to: "/admin/users", label: "People", area: "manageUsers" },
  { to: "/dev/mail", label: "Caught mail", area: "devMail" },
  { to: "/account", label: "Account", area: "account" },
];

export function AppHeader({ user, showDevMail }: { user: PublicUser | null; showDevMail: boolean }) {
  const links = user ? NAV.filter((n) => mayOpen(user.role, n.area) && (n.area !== "devMail" || showDevMail)) : [];
  return (
    <header className="border-b border-rule bg-sheet">
      <div className="mx-auto flex max-w-6xl items-center gap-6 px-4 py-3">
        <a href="/" className="flex items-center gap-2 font-bold text-ink no-underline hover:no-underline">
          <BrandMark />
          <span className="text-lg tracking-tight">Takeline</span>
        </a>
        <nav aria-label="Main" className="flex flex-1 gap-1">
          {links.map((l) => (
            <NavLink
              key={l.to}
              to={l.to}
              className={({ isActive }) =>
                `rounded-control px-3 py-1.5 text-sm font-semibold no-underline hover:no-underline ${isActive ? "bg-action-tint text-action-strong" : "text-ink-soft hover:text-ink"}`
              }
            >
              {l.label}
            </NavLink>
          ))}
        </nav>
        {user && (
          <div className="flex items-center gap-3 text-sm">
            <span className="text-ink-soft" data-testid="signed-in-as">
              {user.name || user.email}
            </span>
            <Badge tone="action">{ROLE_LABELS[user.role]}</Badge>
            <Form method="post" action="/sign-out">
              <button type="submit" className="text-sm font-semibold text-action hover:underline">
                Sign out
              </button>
            </Form>
          </div>
        )}
      </div>
    </header>
  );
}
