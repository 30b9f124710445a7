"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requestClientAddress } from "@/lib/server/auth/request-client-address";
import { requireUser } from "@/lib/server/auth/require-permission";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { editCertificateDraft } from "@/lib/server/certificates/edit-certificate-draft";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { reviseCertificate } from "@/lib/server/certificates/revise-certificate";

export async function createCertificateDraftAction(input: unknown) {
  return toActionResult(async () => {
    const certificate = await createCertificateDraft({ actor: await requireUser("certificate.issue"), input });
    revalidatePath("/certificates", "layout");
    return certificate;
  }, "Draft certificate created.");
}

export async function issueCertificateAction(input: unknown) {
  return toActionResult(async () => {
    const issued = await issueCertificate({ actor: await requireUser("certificate.issue"), input, clientAddress: await requestClientAddress() });
    revalidatePath("/certificates", "layout");
    return issued;
  }, "Certificate signed and issued.");
}

export async function reviseCertificateAction(input: unknown) {
  return toActionResult(async () => {
    const revision = await reviseCertificate({ actor: await requireUser("certificate.issue"), input });
    revalidatePath("/certificates", "layout");
    return revision;
  }, "New draft revision created; sign it to issue it.");
}

export async function editCertificateDraftAction(input: unknown) {
  return toActionResult(async () => {
    const saved = await editCertificateDraft({ actor: await requireUser("certificate.issue"), input });
    revalidatePath("/certificates", "layout");
    return saved;
  }, "Draft saved. Preview it to see the certificate as it will be issued.");
}
