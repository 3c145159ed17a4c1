/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["pg", "nodemailer", "bcryptjs"],
  poweredByHeader: false,
};

export default nextConfig;
