"use client";
import { useActionState } from "react";
import { signInAction, type FormState } from "../actions";
import { Field, FormMessage, Submit } from "../form-parts";

const initial: FormState = { errors: {}, message: null };

export function SignInForm() {
  const [state, action, pending] = useActionState(signInAction, initial);
  return (
    <form action={action} className="mt-8 space-y-4">
      <FormMessage state={state} />
      <Field label="E-mail" name="email" type="email" autoComplete="username" required state={state} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required state={state} />
      <Submit pending={pending}>Sign in</Submit>
    </form>
  );
}
