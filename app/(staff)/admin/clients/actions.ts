"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { addClientContact } from "@/lib/server/clients/add-client-contact";
import { createClientOrganization } from "@/lib/server/clients/create-client-organization";
import { createProject } from "@/lib/server/clients/create-project";
import { updateClientContact } from "@/lib/server/clients/update-client-contact";
import { updateClientOrganization } from "@/lib/server/clients/update-client-organization";
import { updateProject } from "@/lib/server/clients/update-project";

// Each action: who is acting, the operation, and fresh client pages (and the people list, which shows portal users).
const refresh = () => {
  revalidatePath("/admin/clients", "layout");
  revalidatePath("/admin/users");
};

export async function createClientOrganizationAction(input: unknown) {
  return toActionResult(async () => {
    const org = await createClientOrganization({ actor: await requireUser("client.manage"), input });
    refresh();
    return org;
  }, "Client created; add its contacts and projects.");
}

export async function updateClientOrganizationAction(input: unknown) {
  return toActionResult(async () => {
    const org = await updateClientOrganization({ actor: await requireUser("client.manage"), input });
    refresh();
    return org;
  }, "Client saved.");
}

export async function addClientContactAction(input: unknown) {
  return toActionResult(async () => {
    const contact = await addClientContact({ actor: await requireUser("client.manage"), input });
    refresh();
    return contact;
  }, "Contact added.");
}

export async function updateClientContactAction(input: unknown) {
  return toActionResult(async () => {
    const contact = await updateClientContact({ actor: await requireUser("client.manage"), input });
    refresh();
    return contact;
  }, "Contact saved.");
}

export async function createProjectAction(input: unknown) {
  return toActionResult(async () => {
    const project = await createProject({ actor: await requireUser("client.manage"), input });
    refresh();
    return project;
  }, "Project created.");
}

export async function updateProjectAction(input: unknown) {
  return toActionResult(async () => {
    const project = await updateProject({ actor: await requireUser("client.manage"), input });
    refresh();
    return project;
  }, "Project saved.");
}
