/** A moment shown the same on server and client: "2026-12-01 21:58 UTC", with the exact time on hover. */
export function DateTime({ value }: { value: Date | string }) {
  const date = typeof value === 'string' ? new Date(value) : value;
  const iso = date.toISOString();
  return (
    <time dateTime={iso} title={iso} className="numeric whitespace-nowrap">
      {`${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`}
    </time>
  );
}
