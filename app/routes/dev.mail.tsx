import { data, Link, useLoaderData } from "react-router";
import type { Route } from "./+types/dev.mail";
import { Card } from "~/components/ui/card";
import { Table } from "~/components/ui/table";
import { ACCESS } from "~/utils/access";
import { env, isDevOrDemo } from "~/utils/env.server";
import { readCaughtMail } from "~/utils/mail-inbox.server";
import { requireUser } from "~/utils/permissions.server";

export function meta() {
  return [{ title: "Caught mail · Takeline" }];
}

/** Development and demo only: the messages the local fake SMTP server received. */
export async function loader({ request }: Route.LoaderArgs) {
  if (!isDevOrDemo()) throw data(null, { status: 404 });
  await requireUser(request, { roles: ACCESS.devMail });
  return { mails: await readCaughtMail(env().MAIL_DIR), dir: env().MAIL_DIR };
}

export default function DevMail() {
  const { mails, dir } = useLoaderData<typeof loader>();
  return (
    <div className="space-y-6">
      <h1>Caught mail</h1>
      <p className="text-sm text-ink-soft">In development and demo mode no mail leaves this machine: the local SMTP server keeps each message as a file in <code className="font-mono">{dir}</code>.</p>
      <Card>
        <Table
          rows={mails}
          rowKey={(m) => m.file}
          empty="No mail yet."
          columns={[
            { header: "Received", cell: (m) => new Date(m.date).toLocaleString() },
            { header: "To", cell: (m) => m.to },
            { header: "Subject", cell: (m) => <Link to={`/dev/mail/${encodeURIComponent(m.file)}`}>{m.subject}</Link> },
            { header: "Attachments", cell: (m) => m.attachments.map((a) => a.filename).join(", ") || "—" },
          ]}
        />
      </Card>
    </div>
  );
}
