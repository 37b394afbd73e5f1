import "server-only";
import { notFound, redirect } from "next/navigation";
import { HttpError } from "@/lib/http";

/** Pages: a query's 404 becomes the not-found page and its 403 the forbidden page. */
export async function pageGuard<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) notFound();
    if (error instanceof HttpError && error.status === 403) redirect("/forbidden");
    throw error;
  }
}
