import { redirect } from "next/navigation";
import { homePathFor } from "@/db/queries/users";
import { requireUser } from "@/lib/auth/session";

/** After sign-in everyone comes here and goes on to the home of their role. */
export default async function HomeRedirect() {
  redirect(homePathFor(await requireUser()));
}
