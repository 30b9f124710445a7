"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { signInSchema, type SignInInput } from "@/lib/validation/account";
import { Field } from "@/components/ui/field";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await signIn("credentials", { ...values, redirect: false });
    if (!result || result.error) {
      setFailure(result?.error && result.error !== "CredentialsSignin" ? result.error : "That e-mail and password do not match an active account.");
      return;
    }
    router.replace(callbackUrl);
    router.refresh();
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
      <button className="button" type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
