/** The whole HTML page around a printed document: A4, white, system fonts only (PDFs fetch nothing). */
export function DocumentFrame({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <html lang="en">
      {/* A standalone page rendered to static HTML for Chromium, not a Next.js page: a plain <head> is right
          (eslint.config.mjs turns off the rule against <head> for components/documents). */}
      <head>
        <meta charSet="utf-8" />
        <title>{title}</title>
        <style dangerouslySetInnerHTML={{ __html: "@page { size: A4; } html, body { margin: 0; padding: 0; background: #fff; }" }} />
      </head>
      <body>{children}</body>
    </html>
  );
}
