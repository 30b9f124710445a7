"use client";

// A last line for unexpected failures: the person gets a sentence and a way on, never a stack trace.
export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <div className="status-code">something went wrong</div>
        <h1>This page could not be shown</h1>
        <p>Nothing you entered has been lost by this error. Try again; if it keeps happening, tell the lab administrator the time it happened.</p>
        <button className="button" onClick={reset}>Try again</button>
      </div>
    </main>
  );
}
