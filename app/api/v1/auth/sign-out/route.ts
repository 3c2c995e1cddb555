import { publicRoute } from "@/app/_lib/access";
import { signOut } from "@/services/accounts/sign-in";

// Ends the session (a no-op when already signed out) and clears the cookie.
export const POST = publicRoute({}, async () => {
  await signOut();
  return undefined;
});
