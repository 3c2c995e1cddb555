import "server-only";
import { AppError } from "../errors";
import { createSignedInSession } from "../auth";
import { hashPassword } from "../passwords";
import { newId } from "../tokens";
import { getDb } from "@/db/knex";
import { getUserByEmail, insertUser, type UserRecord } from "@/db/queries/accounts";
import { insertMembership, insertWorkspace, type WorkspaceRecord } from "@/db/queries/workspaces";
import { endCurrentSession } from "./sign-in";
import type { SignUpInput } from "./schemas";

const EMAIL_TAKEN = "An account with this e-mail already exists. Sign in instead.";

/** New account and new workspace; the creator is its admin and is signed in. */
export async function signUp(input: SignUpInput): Promise<{ user: UserRecord; workspace: WorkspaceRecord }> {
  if (await getUserByEmail(input.email)) throw emailTaken();
  const passwordHash = await hashPassword(input.password);
  const ids = { user: newId("usr"), workspace: newId("ws") };
  const created = await getDb()
    .transaction(async (trx) => {
      const user = await insertUser({ id: ids.user, email: input.email, displayName: input.displayName, passwordHash }, trx);
      const workspace = await insertWorkspace({ id: ids.workspace, name: input.workspaceName }, trx);
      await insertMembership({ workspaceId: workspace.id, userId: user.id, role: "admin" }, trx);
      return { user, workspace };
    })
    .catch((err: { code?: string }) => {
      if (err.code === "23505") throw emailTaken(); // unique e-mail, lost a race
      throw err;
    });
  await endCurrentSession();
  await createSignedInSession({ userId: created.user.id, workspaceId: created.workspace.id });
  return created;
}

function emailTaken(): AppError {
  return new AppError("conflict", EMAIL_TAKEN, [{ path: "email", message: EMAIL_TAKEN }]);
}
