import "server-only";
import { cookies } from "next/headers";
import { env } from "@/lib/env";
import { KNOWN_DEVICE_COOKIE, KNOWN_DEVICE_MAX_AGE_S, rememberDevice } from "./known-device";

/** After a password sign-in from a form: this browser now counts as known for that account. */
export async function rememberThisDevice(email: string) {
  const jar = await cookies();
  jar.set(KNOWN_DEVICE_COOKIE, rememberDevice(jar.get(KNOWN_DEVICE_COOKIE)?.value, email, env.AUTH_SECRET), {
    httpOnly: true,
    sameSite: "lax",
    secure: env.MOTTLE_MODE === "production",
    path: "/",
    maxAge: KNOWN_DEVICE_MAX_AGE_S,
  });
}
