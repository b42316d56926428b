import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { authOptions } from '@/app/_server/auth/options';

type Context = { params: Promise<{ nextauth: string[] }> };

function handler(request: NextRequest, context: Context) {
  return NextAuth(request, context, authOptions());
}

export { handler as GET, handler as POST };
