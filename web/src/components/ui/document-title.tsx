/** Sets the browser tab's title for the current page (React hoists <title> into <head>). */
export function DocumentTitle({ title }: { title: string }) {
  return <title>{`${title} · Liftwright`}</title>;
}
