import bcrypt from "bcryptjs";
import { clearFailures, isThrottled, recordFailure } from "./throttle";
import { getUserByEmail } from "./users";

// A real hash of a random string: comparing against it costs what a real check costs,
// so an unknown e-mail takes as long to refuse as a wrong password.
const DECOY_HASH = bcrypt.hashSync(`decoy-${crypto.randomUUID()}`, 11);

/** Checks a password with throttling per e-mail and per address. */
export async function checkPassword(email: string, password: string, address: string) {
  const keys = [`email:${email}`, `addr:${address}`];
  for (const key of keys) if (await isThrottled(key)) return "throttled" as const;
  const user = await getUserByEmail(email);
  const ok = await bcrypt.compare(password, user?.passwordHash ?? DECOY_HASH);
  if (!user || !user.passwordHash || !ok) {
    await Promise.all(keys.map((key) => recordFailure(key)));
    return null;
  }
  await clearFailures(`email:${email}`);
  return user;
}
