import { index, prefix, route, type RouteConfig } from "@react-router/dev/routes";

export default [
  index("routes/_index.tsx"),
  route("sign-in", "routes/sign-in.tsx"),
  route("sign-out", "routes/sign-out.tsx"),
  route("forgot-password", "routes/forgot-password.tsx"),
  route("reset-password/:token", "routes/reset-password.$token.tsx"),
  route("invitations/:token", "routes/invitations.$token.tsx"),
  route("account", "routes/account.tsx"),
  route("projects", "routes/projects._index.tsx"),
  route("projects/new", "routes/projects.new.tsx"),
  route("projects/:projectId", "routes/projects.$projectId.tsx"),
  route("work", "routes/work.tsx"),
  route("calculator", "routes/calculator.tsx"),
  route("admin/users", "routes/admin.users.tsx"),
  route("dev/mail", "routes/dev.mail.tsx"),
  route("dev/mail/:file", "routes/dev.mail.$file.tsx"),
  ...prefix("api/v1", [
    route("tokens", "routes/api.v1.tokens.ts"),
    route("me", "routes/api.v1.me.ts"),
    route("invitations", "routes/api.v1.invitations.ts"),
    route("curves/simple", "routes/api.v1.curves.simple.ts"),
    route("curves/compound", "routes/api.v1.curves.compound.ts"),
    route("alignments/geometry", "routes/api.v1.alignments.geometry.ts"),
  ]),
  route("api/*", "routes/api.not-found.ts"),
  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
