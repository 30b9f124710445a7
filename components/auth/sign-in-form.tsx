"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { signInSchema, type SignInInput } from "@/lib/validation/account";
import { Field } from "@/components/ui/field";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [failure, setFailure] = useState<string | null>(null);
  const [leaving, setLeaving] = useState(false);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await signIn("credentials", { ...values, redirect: false });
    if (!result || result.error) {
      setFailure(result?.error && result.error !== "CredentialsSignin" ? result.error : "That e-mail and password do not match an active account.");
      return;
    }
    // A full page load, not a client-side transition: the router still holds what the server answered while
    // signed out (the prefetched "/" redirecting to this page), and following that loops back here with a
    // blank page. A fresh document request carries the new session cookie to every server component.
    setLeaving(true);
    window.location.assign(callbackUrl);
  });

  return (
    <form className="stack" onSubmit={onSubmit} noValidate>
      {failure && <div className="notice notice-error" role="alert">{failure}</div>}
      <Field label="E-mail" error={formState.errors.email?.message}>
        <input type="email" autoComplete="username" autoFocus {...register("email")} />
      </Field>
      <Field label="Password" error={formState.errors.password?.message}>
        <input type="password" autoComplete="current-password" {...register("password")} />
      </Field>
      <button className="button" type="submit" disabled={formState.isSubmitting || leaving}>
        {formState.isSubmitting || leaving ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
