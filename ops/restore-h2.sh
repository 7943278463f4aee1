#!/usr/bin/env bash
# Restores an H2 backup zip made by backup-h2.sh. Stop the service first; the current files are moved aside.
# Usage: ops/restore-h2.sh backup.zip [data-dir]
set -euo pipefail
zip=${1:?backup zip}
dir=${2:-./data}
if [ -d "$dir" ]; then
  mv "$dir" "$dir.before-restore-$(date -u +%Y%m%dT%H%M%SZ)"
fi
mkdir -p "$dir"
h2=$(find "${HOME}/.m2/repository/com/h2database/h2" -name 'h2-*.jar' | sort | tail -n 1)
java -cp "$h2" org.h2.tools.Restore -file "$zip" -dir "$dir"
echo "restored into $dir; start the service again"
