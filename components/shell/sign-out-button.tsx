"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" className="button button-quiet" onClick={() => void signOut({ callbackUrl: "/sign-in" })}>
      Sign out
    </button>
  );
}
