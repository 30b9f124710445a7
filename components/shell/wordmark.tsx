import Link from "next/link";

export function Wordmark() {
  return (
    <Link href="/" className="wordmark">
      <span className="wordmark-drop" aria-hidden="true" />
      Seepline
    </Link>
  );
}
