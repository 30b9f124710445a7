import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { computeRollProgress } from "@/lib/portal/roll-progress";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { listPortalCertificates } from "./list-portal-certificates";
import { organizationScope } from "./organization-scope";

/**
 * One of the actor's organisation's projects for the client portal: its shipments (with whether the receipt
 * was acknowledged), its rolls with their progress through the chain, and its certificates. Dates and states
 * only: no staff names, notes or storage places. Another organisation's project is NOT_FOUND.
 */
export async function getPortalProject(options: { actor: CurrentUser; projectCode: string }) {
  const { actor } = options;
  requirePermission(actor, "portal.view");
  const scope = organizationScope(actor);
  const projectCode = options.projectCode.trim();
  const project = await getDb().project.findFirst({
    where: { code: projectCode, ...scope },
    select: {
      code: true, name: true, siteName: true, siteLocation: true,
      shipments: {
        orderBy: { receivedAt: "asc" },
        select: { labNumber: true, receivedAt: true, acknowledgedAt: true, _count: { select: { rolls: true } } },
      },
      rolls: {
        orderBy: { labNumber: "asc" },
        select: {
          labNumber: true, rollNumber: true, lotNumber: true, product: true,
          shipment: { select: { labNumber: true, receivedAt: true } },
          coupons: {
            select: {
              cutAt: true,
              specimens: {
                select: {
                  preparedAt: true,
                  runs: {
                    select: {
                      state: true, assignedAt: true, terminatedAt: true,
                      results: {
                        select: {
                          id: true,
                          certificateResults: {
                            // Only issued revisions count, and only the organisation's own certificates.
                            where: { revision: { status: "ISSUED", certificate: scope } },
                            select: {
                              revision: {
                                select: {
                                  issuedAt: true, certificate: { select: { number: true } },
                                  // A result offered to a draft and then left out is not on it: the final content says.
                                  contents: { orderBy: { version: "desc" }, take: 1, select: { resultIds: true } },
                                },
                              },
                            },
                          },
                        },
                      },
                    },
                  },
                },
              },
            },
          },
        },
      },
    },
  });
  if (!project) throw new AppError("NOT_FOUND", `No project ${projectCode} of your organisation.`);
  const certificates = await listPortalCertificates({ actor, projectCode: project.code });
  return {
    code: project.code,
    name: project.name,
    siteName: project.siteName,
    siteLocation: project.siteLocation,
    shipments: project.shipments.map((s) => ({ labNumber: s.labNumber, receivedAt: s.receivedAt, acknowledgedAt: s.acknowledgedAt, rollCount: s._count.rolls })),
    rolls: project.rolls.map((roll) => {
      const onCertificates = roll.coupons.flatMap((c) => c.specimens.flatMap((s) => s.runs.flatMap((r) => r.results.flatMap((res) => res.certificateResults.map((cr) => cr.revision).filter((rev) => includesResult(rev.contents, res.id))))));
      return {
        labNumber: roll.labNumber,
        rollNumber: roll.rollNumber,
        lotNumber: roll.lotNumber,
        product: roll.product,
        shipmentLabNumber: roll.shipment.labNumber,
        certificateNumbers: [...new Set(onCertificates.map((r) => r.certificate.number))].sort(),
        progress: computeRollProgress({
          receivedAt: roll.shipment.receivedAt,
          coupons: roll.coupons.map((c) => ({ cutAt: c.cutAt, specimens: c.specimens.map((s) => ({ preparedAt: s.preparedAt, runs: s.runs })) })),
          certificateIssuedAt: onCertificates.flatMap((r) => (r.issuedAt ? [r.issuedAt] : [])),
        }),
      };
    }),
    certificates,
  };
}

export type PortalProject = Awaited<ReturnType<typeof getPortalProject>>;

/** A revision without content versions (issued before drafts could be edited) carries every result offered to it. */
function includesResult(contents: Array<{ resultIds: string[] }>, resultId: string): boolean {
  return contents.length === 0 || contents[0]!.resultIds.includes(resultId);
}
