/** React 19 lifts <title> into the document head, so each page names its tab. */
export function DocumentTitle({ title }: { title: string }) {
  return <title>{`${title} · Gelpoint`}</title>;
}
