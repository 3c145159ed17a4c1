# Shared by demo.sh and test.sh: install when needed, and a session secret kept in .data.
ensure_dependencies() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "[setup] installing dependencies (npm ci)" >&2
    npm ci --no-audit --no-fund
  fi
}

ensure_secret() {
  mkdir -p .data
  [ -s .data/nextauth-secret ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))" >.data/nextauth-secret
  cat .data/nextauth-secret
}
