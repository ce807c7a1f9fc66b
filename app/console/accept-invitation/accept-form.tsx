"use client";
import { useActionState } from "react";
import { acceptInvitationAction, type FormState } from "../actions";
import { Field, FormMessage, Submit } from "../form-parts";

const initial: FormState = { errors: {}, message: null };

export function AcceptForm({ token }: { token: string }) {
  const [state, action, pending] = useActionState(acceptInvitationAction, initial);
  return (
    <form action={action} className="mt-8 space-y-4">
      <FormMessage state={state} />
      <input type="hidden" name="token" value={token} />
      <Field label="Your name" name="name" autoComplete="name" state={state} />
      <Field label="New password (at least 12 characters)" name="password" type="password" autoComplete="new-password" minLength={12} required state={state} />
      <Field label="The same password again" name="confirm" type="password" autoComplete="new-password" required state={state} />
      <Submit pending={pending}>Join the team</Submit>
    </form>
  );
}
