#!/usr/bin/env bash
# Starts Glassgrade with demo data at http://localhost:3000 on a fresh machine: dependencies, PostgreSQL,
# migrations, seed, the development mail receiver, a production build, then `next start`.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export NEXT_TELEMETRY_DISABLED=1
PORT="${PORT:-3000}"
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url glassgrade)}"
export NEXTAUTH_URL="${NEXTAUTH_URL:-http://localhost:$PORT}"
mkdir -p .data
# A per-checkout secret, made once, so sessions survive restarts of the demo.
[ -f .data/nextauth-secret ] || head -c 32 /dev/urandom | base64 > .data/nextauth-secret
export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(cat .data/nextauth-secret)}"
export SMTP_PORT="${SMTP_PORT:-2525}"
export EMAIL_SERVER="${EMAIL_SERVER:-smtp://127.0.0.1:$SMTP_PORT}"
# The console's development mailbox page shows what the fake receiver caught.
export DEV_MAILBOX="${DEV_MAILBOX:-1}"
# The sign-in page lists the demo accounts.
export GLASSGRADE_DEMO="${GLASSGRADE_DEMO:-1}"

port_busy() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }
if port_busy "$PORT"; then
  echo "[demo] port $PORT is already in use (another Glassgrade demo?). Stop it, or run: PORT=3001 npm run demo" >&2
  exit 1
fi

bash scripts/ensure-deps.sh
bash scripts/pg.sh start
bash scripts/pg.sh createdb glassgrade
npx tsx db/migrate.ts
npx tsx db/seed.ts | tee .data/demo-seed.txt

if [ -f scripts/dev-smtp.ts ]; then
  npx tsx scripts/dev-smtp.ts >.data/dev-smtp.log 2>&1 &
  smtp_pid=$!
  trap 'kill $smtp_pid 2>/dev/null || true' EXIT
fi

echo "[demo] building the app (log: .data/demo-build.log)"
npx next build >.data/demo-build.log 2>&1 || { tail -40 .data/demo-build.log; exit 1; }

demo_key="$(sed -n 's/.*sandbox API key (demo only): //p' .data/demo-seed.txt | tail -1)"
cat <<MSG

  Glassgrade is starting at http://localhost:$PORT
  Sign in at http://localhost:$PORT/console (password for every account: glassgrade-demo)
    admin@northmere.example       admin      Northmere Fibre
    engineer@northmere.example    engineer   Northmere Fibre
    auditor@northmere.example     auditor    Northmere Fibre
    developer@northmere.example   developer  Northmere Fibre
    admin@calder.example          admin      Calder Splice & Test
  Demo sandbox API key (Northmere, demo only): ${demo_key:-see .data/demo-seed.txt}
    curl -s http://localhost:$PORT/api/v1/verdicts?limit=3 -H "Authorization: Bearer ${demo_key:-KEY}"
  API reference: http://localhost:$PORT/docs/api    Mail sent by the app: http://localhost:$PORT/console/mailbox
  Stop with Ctrl-C; stop the database with: npm run db:stop

MSG
# Loopback only by default: the demo's accounts share one published password. HOST=0.0.0.0 serves the LAN.
node node_modules/next/dist/bin/next start -p "$PORT" -H "${HOST:-127.0.0.1}"
