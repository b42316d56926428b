/**
 * GET  /api/designs?teamId=…  the designs of a team (the caller's current team when omitted)
 * POST /api/designs            create a design in a team (owners and designers)
 */
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db';
import { designs } from '@/db/schema';
import { createDesign } from '@/db/queries/designs';
import { createDesignSchema } from '@/lib/schemas/designs';
import { ApiError, handle, json, parseBody, parseQuery } from '@/app/_server/http';
import { authorize, requireMember, requireUser } from '@/app/_server/session';

const listQuery = z.object({ teamId: z.uuid('teamId must be a team id.').optional() });

export const GET = handle(async (request, { requestId }) => {
  const { teamId } = parseQuery(request, listQuery);
  const member = await requireMember(teamId);
  authorize(member.actor, 'design.view');
  const rows = await db
    .select({ id: designs.id, name: designs.name, description: designs.description, updatedAt: designs.updatedAt })
    .from(designs)
    .where(eq(designs.teamId, member.team.id))
    .orderBy(desc(designs.updatedAt));
  return json({ teamId: member.team.id, designs: rows }, { requestId });
});

async function exampleScript(name: string | undefined): Promise<string> {
  if (!name) return '';
  try {
    return await readFile(path.join(process.cwd(), 'examples', `${name}.zw`), 'utf8');
  } catch {
    throw new ApiError(400, 'The request body has problems.', [{ path: 'example', message: 'Unknown example.' }]);
  }
}

export const POST = handle(async (request, { requestId }) => {
  // Signed-in check first, so an anonymous caller learns nothing about the payload.
  await requireUser();
  const input = await parseBody(request, createDesignSchema);
  const member = await requireMember(input.teamId);
  authorize(member.actor, 'design.create');
  const workingScript = await exampleScript(input.example);
  const design = await createDesign({
    teamId: member.team.id,
    name: input.name,
    description: input.description,
    processProfile: input.processProfile,
    script: workingScript,
    userId: member.user.id,
  });
  return json({ design }, { status: 201, requestId });
});
