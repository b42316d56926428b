'use server';

import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { db } from '@/db';
import { users } from '@/db/schema';
import { passwordSchema, personNameSchema } from '@/lib/auth';
import { checkPassword } from '@/app/_server/auth/options';
import { getCurrentUser } from '@/app/_server/session';
import { PREFERENCE_FIELDS } from './preferences';

export interface FormState {
  ok: boolean;
  message: string;
  problems?: Record<string, string>;
}

const problemsOf = (error: z.ZodError) => Object.fromEntries(error.issues.map((i) => [i.path.join('.'), i.message]));

const profileSchema = z.object({ name: personNameSchema });

export async function saveProfile(_previous: FormState, form: FormData): Promise<FormState> {
  const user = await getCurrentUser();
  if (!user) return { ok: false, message: 'Your session has ended. Sign in again; nothing was saved.' };
  const parsed = profileSchema.safeParse({ name: form.get('name') });
  if (!parsed.success) return { ok: false, message: 'Check the highlighted field.', problems: problemsOf(parsed.error) };
  await db.update(users).set({ name: parsed.data.name, updatedAt: new Date() }).where(eq(users.id, user.id));
  revalidatePath('/', 'layout');
  return { ok: true, message: 'Profile saved.' };
}

const passwordChangeSchema = z
  .object({ current: z.string(), next: passwordSchema, confirm: z.string() })
  .refine((v) => v.next === v.confirm, { message: 'The two new passwords differ.', path: ['confirm'] });

export async function changePassword(_previous: FormState, form: FormData): Promise<FormState> {
  const user = await getCurrentUser();
  if (!user) return { ok: false, message: 'Your session has ended. Sign in again; nothing was saved.' };
  const parsed = passwordChangeSchema.safeParse({ current: form.get('current') ?? '', next: form.get('next'), confirm: form.get('confirm') });
  if (!parsed.success) return { ok: false, message: 'Check the highlighted fields.', problems: problemsOf(parsed.error) };
  if (user.passwordHash && !(await checkPassword(user.email, parsed.data.current))) {
    return { ok: false, message: 'Check the highlighted fields.', problems: { current: 'That is not your current password.' } };
  }
  await db.update(users).set({ passwordHash: await bcrypt.hash(parsed.data.next, 10), updatedAt: new Date() }).where(eq(users.id, user.id));
  return { ok: true, message: 'Password changed. Use it next time you sign in.' };
}

export async function savePreferences(_previous: FormState, form: FormData): Promise<FormState> {
  const user = await getCurrentUser();
  if (!user) return { ok: false, message: 'Your session has ended. Sign in again; nothing was saved.' };
  const values = Object.fromEntries(Object.keys(PREFERENCE_FIELDS).map((field) => [field, form.get(field) === 'on'])) as Record<
    keyof typeof PREFERENCE_FIELDS,
    boolean
  >;
  await db.update(users).set({ ...values, updatedAt: new Date() }).where(eq(users.id, user.id));
  return { ok: true, message: 'E-mail preferences saved.' };
}
