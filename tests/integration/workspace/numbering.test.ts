/**
 * Revision numbering against the real PostgreSQL: concurrent saves get distinct, gap-free numbers and
 * every script is kept; a save from a stale page never overwrites the newer working script.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { closeDb, db } from '@/db';
import { designs, revisions } from '@/db/schema';
import { saveDraft } from '@/db/queries/designs';
import { createRevision, listRevisions } from '@/db/queries/revisions';
import { makeTeam, type TestTeam } from '../review/fixtures';

let team: TestTeam;

beforeAll(async () => {
  team = await makeTeam();
});
afterAll(closeDb);

async function designVersion(): Promise<number> {
  const [row] = await db.select({ version: designs.version }).from(designs).where(eq(designs.id, team.designId));
  return row.version;
}

describe('revision numbers', () => {
  it('gives 24 simultaneous saves the numbers 1..24, each with its own script', async () => {
    const base = await designVersion();
    const saves = Array.from({ length: 24 }, (_, i) =>
      createRevision({
        designId: team.designId,
        authorId: i % 2 ? team.members.designer.id : team.members.owner.id,
        source: `# save ${i}\nwavelength 405 nm\n`,
        message: `concurrent save ${i}`,
        baseVersion: base,
      }),
    );
    const created = await Promise.all(saves);
    const numbers = created.map((c) => c.number).sort((a, b) => a - b);
    expect(numbers).toEqual(Array.from({ length: 24 }, (_, i) => i + 1));

    const stored = await listRevisions(team.designId);
    expect(stored).toHaveLength(24);
    // Nothing lost: each save's script is stored under the number it was given.
    for (const c of created) {
      const row = stored.find((r) => r.id === c.id)!;
      expect(row.number).toBe(c.number);
      expect(row.source).toBe(`# save ${created.indexOf(c)}\nwavelength 405 nm\n`);
      expect(row.buildStatus).toBe('queued');
    }
    // Exactly one save found the draft at the version its page had loaded; the others left it alone.
    expect(created.filter((c) => c.designVersion !== null)).toHaveLength(1);
    const [design] = await db.select().from(designs).where(eq(designs.id, team.designId));
    expect(design.lastRevisionNumber).toBe(24);
  });

  it('refuses a duplicate number at the database level', async () => {
    const [first] = await db.select().from(revisions).where(eq(revisions.designId, team.designId)).limit(1);
    await expect(
      db.insert(revisions).values({ designId: team.designId, number: first.number, source: 'x', authorId: team.members.designer.id }),
    ).rejects.toThrow();
  });
});

describe('stale edits', () => {
  it('keeps the newer working script when a page from before it saves', async () => {
    const loadedAt = await designVersion();
    const first = await saveDraft(team.designId, team.members.owner.id, 'focal length from the owner', loadedAt);
    expect(first.ok).toBe(true);

    const stale = await saveDraft(team.designId, team.members.designer.id, 'older text from the designer', loadedAt);
    expect(stale.ok).toBe(false);
    if (!stale.ok) {
      expect(stale.current.version).toBe(loadedAt + 1);
      expect(stale.current.updatedByName).toBe(team.members.owner.name);
    }

    // A revision saved from the stale page is kept, but does not replace the working script either.
    const saved = await createRevision({
      designId: team.designId,
      authorId: team.members.designer.id,
      source: 'older text from the designer',
      message: 'from a stale page',
      baseVersion: loadedAt,
    });
    expect(saved.designVersion).toBeNull();
    const [design] = await db.select().from(designs).where(eq(designs.id, team.designId));
    expect(design.workingScript).toBe('focal length from the owner');
    const [row] = await db.select().from(revisions).where(eq(revisions.id, saved.id));
    expect(row.source).toBe('older text from the designer');
  });
});
