#!/usr/bin/env bash
# npm run restore -- <archive> [--into NAME] [--replace]
# Loads a backup made by `npm run backup` into the private MariaDB:
#   --into NAME  the database to restore into (default: BAYWALK_DB_NAME, i.e. baywalk)
#   --replace    allowed to drop and replace a database that already has tables
# The photos go into BAYWALK_PHOTOS_DIR (default .data/photos); files already
# there are kept. Stop the server first when restoring over its own database.
set -euo pipefail
source "$(dirname "$0")/env.sh"

ARCHIVE=""
DB="$BAYWALK_DB_NAME"
REPLACE=0
while [ $# -gt 0 ]; do
  case "$1" in
    --into) DB="${2:-}"; shift 2 ;;
    --replace) REPLACE=1; shift ;;
    -*) die "unknown option $1 (use --into NAME and --replace)" ;;
    *) ARCHIVE="$1"; shift ;;
  esac
done
[ -n "$ARCHIVE" ] || die "name the backup to restore: npm run restore -- .data/backups/baywalk-….tar.gz"
[ -f "$ARCHIVE" ] || die "there is no file $ARCHIVE"
[[ "$DB" =~ ^[A-Za-z0-9_]+$ ]] || die "a database name is letters, digits and underscores only (got '$DB')"

SOCK_FILE="$BAYWALK_DATA_DIR/run/socket-path"
[ -f "$SOCK_FILE" ] || die "the private MariaDB has never started here; run 'npm run db:up' first"
SOCK=$(cat "$SOCK_FILE")
mariadb-admin --no-defaults -S "$SOCK" -uroot ping >/dev/null 2>&1 || die "the private MariaDB is not running; start it with 'npm run db:up'"
sql() { mariadb --no-defaults -S "$SOCK" -uroot -N -e "$1"; }

WORK=$(mktemp -d "${TMPDIR:-/tmp}/baywalk-restore.XXXXXX")
trap 'rm -rf "$WORK"' EXIT
tar -xzf "$ARCHIVE" -C "$WORK" || die "$ARCHIVE is not a readable backup archive"
[ -f "$WORK/database.sql" ] && [ -f "$WORK/manifest.txt" ] || die "$ARCHIVE is not a Baywalk backup (no database.sql or manifest.txt)"

EXISTING=$(sql "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = '$DB'")
if [ "$EXISTING" != 0 ] && [ "$REPLACE" != 1 ]; then
  die "database $DB already has $EXISTING tables; restore into another with --into NAME, or pass --replace to overwrite it"
fi
sql "DROP DATABASE IF EXISTS \`$DB\`; CREATE DATABASE \`$DB\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
     CREATE USER IF NOT EXISTS '$BAYWALK_DB_USER'@'127.0.0.1' IDENTIFIED BY '$BAYWALK_DB_PASSWORD';
     GRANT ALL PRIVILEGES ON \`$DB\`.* TO '$BAYWALK_DB_USER'@'127.0.0.1';"
mariadb --no-defaults -S "$SOCK" -uroot --default-character-set=utf8mb4 "$DB" < "$WORK/database.sql" || die "loading the dump into $DB failed"

PHOTOS="${BAYWALK_PHOTOS_DIR:-$BAYWALK_DATA_DIR/photos}"
mkdir -p "$PHOTOS"
# Photo files are named by their id and never change: keep any that are already there.
(cd "$WORK/photos" && find . -type f -print0 | while IFS= read -r -d '' f; do
  [ -e "$PHOTOS/$f" ] || { mkdir -p "$PHOTOS/$(dirname "$f")"; cp -p "$f" "$PHOTOS/$f"; }
done)
TABLES=$(sql "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = '$DB'")
say "restored $ARCHIVE into database $DB ($TABLES tables) and photos into $PHOTOS"
