"use server";
import { signOut } from "@/auth";

/** Sign the person out and return to the start page. */
export async function signOutAction(): Promise<void> {
  await signOut({ redirectTo: "/" });
}
