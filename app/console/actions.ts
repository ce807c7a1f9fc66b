"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { acceptInvitation } from "@/api-core/access/mutations";
import { signIn } from "@/api-core/access/sign-in";
import { ProblemError } from "@/api-core/http/problem";
import { AcceptInvitationBody, SignInBody } from "@/openapi/admin";
import { setSessionCookies } from "./session";

/** What a console form shows after a failed submit: errors per field, one message, and the values to keep. */
export interface FormState {
  errors: Record<string, string[]>;
  message: string | null;
  fields?: Record<string, string>;
}

function failure(error: unknown): FormState {
  if (error instanceof z.ZodError) return { errors: z.flattenError(error).fieldErrors as Record<string, string[]>, message: "Check the highlighted fields." };
  if (error instanceof ProblemError) return { errors: {}, message: error.detail };
  // Internals stay in the server log; the page gets a generic message.
  console.error("Console action failed", error);
  return { errors: {}, message: "Something went wrong on our side; try again." };
}

export async function signInAction(_state: FormState, form: FormData): Promise<FormState> {
  // React resets the form after an action; the e-mail comes back so only the password is retyped.
  const fields = { email: String(form.get("email") ?? "") };
  try {
    const { email, password } = SignInBody.parse({ email: form.get("email"), password: form.get("password") });
    const address = (await headers()).get("x-forwarded-for")?.split(",")[0]?.trim() || "unknown";
    await setSessionCookies(await signIn(email, password, address));
  } catch (error) {
    return { ...failure(error), fields };
  }
  redirect("/console");
}

const AcceptForm = AcceptInvitationBody.extend({ confirm: z.string() }).refine((v) => v.password === v.confirm, { path: ["confirm"], message: "the two passwords differ" });

export async function acceptInvitationAction(_state: FormState, form: FormData): Promise<FormState> {
  try {
    const { confirm: _confirm, ...input } = AcceptForm.parse({
      token: form.get("token"),
      name: form.get("name") || undefined,
      password: form.get("password"),
      confirm: form.get("confirm"),
    });
    await setSessionCookies(await acceptInvitation(input));
  } catch (error) {
    return { ...failure(error), fields: { name: String(form.get("name") ?? "") } };
  }
  redirect("/console");
}

export async function signOutAction(): Promise<void> {
  await setSessionCookies(null);
  redirect("/console/sign-in");
}
