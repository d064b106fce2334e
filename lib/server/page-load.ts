import "server-only";
import { notFound } from "next/navigation";
import { ApiError } from "./errors";

/** For pages: a 404 from the server layer (missing, or another organisation's) shows the not-found page. */
export async function orNotFound<T>(load: Promise<T>): Promise<T> {
  try {
    return await load;
  } catch (e) {
    if (e instanceof ApiError && e.status === 404) notFound();
    throw e;
  }
}
