/** @type {import('next').NextConfig} */
const nextConfig = {
  // Native and Node-only packages stay out of the server bundle.
  serverExternalPackages: ['pg', 'pg-boss', 'smtp-server', 'mailparser', 'bcryptjs', 'clipper-lib'],
  poweredByHeader: false,
};

export default nextConfig;
