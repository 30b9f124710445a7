import Link from "next/link";
import { notFound } from "next/navigation";
import { IndexTestForm } from "@/components/index-tests/index-test-form";
import { isAppError } from "@/lib/errors/app-error";
import { isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getIndexTestEntry } from "@/lib/server/index-tests/get-index-test-entry";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ rollLabNumber: string; method: string }> };

export async function generateMetadata({ params }: Props) {
  const { rollLabNumber, method } = await params;
  return { title: `ASTM ${method} on ${rollLabNumber}` };
}

export default async function NewIndexTestPage({ params }: Props) {
  const actor = await requirePageUser("run.operate");
  const { rollLabNumber, method } = await params;
  if (!isIndexMethodCode(method)) notFound();
  const [entry, zone] = await Promise.all([
    getIndexTestEntry({ actor, rollLabNumber: decodeURIComponent(rollLabNumber), methodCode: method }).catch((error) => {
      if (isAppError(error) && error.code === "NOT_FOUND") notFound();
      throw error;
    }),
    getLabTimeZone(),
  ]);
  return (
    <>
      <div className="page-head">
        <div>
          <h1>{entry.method.title}</h1>
          <p className="muted">Roll <Link className="mono" href={`/samples/rolls/${entry.roll.labNumber}`}>{entry.roll.labNumber}</Link> · roll {entry.roll.rollNumber}, lot {entry.roll.lotNumber} · {entry.roll.project.name} · settings {entry.settingsVersion === null ? "as installed" : `version ${entry.settingsVersion}`} (<Link href="/methods">method settings</Link>)</p>
        </div>
      </div>
      {entry.returnedId && <p className="notice">QA returned the last test of this kind on this roll; this one replaces it (<Link href={`/index-tests/${entry.returnedId}`}>see the comments</Link>).</p>}
      {entry.method.needsCoupon && entry.coupons.length === 0 ? (
        <p className="notice notice-error">No coupon of this roll was cut for {entry.method.couponWhat} yet: <Link href={`/samples/rolls/${entry.roll.labNumber}`}>cut one on the roll page</Link> first.</p>
      ) : (
        <section className="card">
          <IndexTestForm methodCode={method} rollId={entry.roll.id} rollLabNumber={entry.roll.labNumber} settings={entry.settings} zone={zone} coupons={entry.coupons} defaultCouponId={entry.defaultCouponId} instruments={entry.instruments} correctsId={entry.returnedId ?? undefined} />
        </section>
      )}
    </>
  );
}
