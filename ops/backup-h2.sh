#!/usr/bin/env bash
# Online backup of the embedded H2 database to a zip, using H2's own BACKUP command (consistent while running).
# Usage: ops/backup-h2.sh [jdbc-url] [target.zip]
set -euo pipefail
url=${1:-jdbc:h2:file:./data/depotcast}
target=${2:-depotcast-backup-$(date -u +%Y%m%dT%H%M%SZ).zip}
h2=$(find "${HOME}/.m2/repository/com/h2database/h2" -name 'h2-*.jar' | sort | tail -n 1)
[ -n "$h2" ] || { echo "H2 jar not found; run 'mvn -B package' once" >&2; exit 1; }
java -cp "$h2" org.h2.tools.Shell -url "$url;AUTO_SERVER=TRUE" -user "${DEPOTCAST_DB_USER:-sa}" \
  -password "${DEPOTCAST_DB_PASSWORD:-}" -sql "BACKUP TO '$target'"
echo "backup written to $target"
