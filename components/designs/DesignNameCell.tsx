import Link from 'next/link';

/** The first cell of a design table row: the design's name, linking to its workspace, and its description. */
export function DesignNameCell({ design }: { design: { id: string; name: string; description: string | null } }) {
  return (
    <td className="py-2 pr-4">
      <Link href={`/designs/${design.id}`} className="font-medium">
        {design.name}
      </Link>
      {design.description ? <p className="text-xs text-ink/60">{design.description}</p> : null}
    </td>
  );
}
