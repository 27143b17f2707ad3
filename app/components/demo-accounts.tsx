import { ROLE_LABELS, type Role } from "~/utils/roles";
import { Card } from "./ui/card";

/** Shown on the sign-in page in demo mode only. */
export function DemoAccounts({ accounts, password }: { accounts: { email: string; role: Role }[]; password: string }) {
  return (
    <Card title="Demo accounts">
      <p className="mb-3 text-sm text-ink-soft">
        This is a demo with invented data. Every account's password is <code className="font-mono">{password}</code>.
      </p>
      <ul className="space-y-1 text-sm">
        {accounts.map((a) => (
          <li key={a.email} className="flex justify-between gap-4">
            <code className="font-mono">{a.email}</code>
            <span className="text-ink-soft">{ROLE_LABELS[a.role]}</span>
          </li>
        ))}
      </ul>
    </Card>
  );
}
