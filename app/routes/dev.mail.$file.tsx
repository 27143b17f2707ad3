import { data, Link, useLoaderData } from "react-router";
import type { Route } from "./+types/dev.mail.$file";
import { Card } from "~/components/ui/card";
import { ACCESS } from "~/utils/access";
import { env, isDevOrDemo } from "~/utils/env.server";
import { parseCaughtMail } from "~/utils/mail-inbox.server";
import { requireUser } from "~/utils/permissions.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  if (!isDevOrDemo()) throw data(null, { status: 404 });
  await requireUser(request, { roles: ACCESS.devMail });
  // Only bare .eml names inside MAIL_DIR: no path separators, so no way out of the folder.
  if (!/^[\w.-]+\.eml$/.test(params.file)) throw data(null, { status: 404 });
  try {
    return { mail: await parseCaughtMail(env().MAIL_DIR, params.file) };
  } catch {
    throw data(null, { status: 404 });
  }
}

/** Links in the body become clickable so a developer can follow an invitation or reset link. */
function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) => (/^https?:\/\//.test(part) ? <a key={i} href={part}>{part}</a> : part));
}

export default function DevMailMessage() {
  const { mail } = useLoaderData<typeof loader>();
  return (
    <div className="space-y-4">
      <Link to="/dev/mail">← All caught mail</Link>
      <Card title={mail.subject}>
        <p className="text-sm text-ink-soft">To {mail.to} · {new Date(mail.date).toLocaleString()}</p>
        <pre className="mt-4 font-sans text-sm whitespace-pre-wrap" data-testid="mail-body">{linkify(mail.text)}</pre>
        {mail.attachments.length > 0 && <p className="mt-4 text-sm">Attachments: {mail.attachments.map((a) => `${a.filename} (${a.size} B)`).join(", ")}</p>}
      </Card>
    </div>
  );
}
