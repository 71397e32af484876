#!/usr/bin/env bash
# npm run backup: one timestamped archive of the private database and the
# photos folder, under .data/backups/ (or BAYWALK_BACKUP_DIR).
#   - the database: mariadb-dump --single-transaction over the private socket
#     (a consistent snapshot without stopping the server or locking writers);
#   - the photos: copied AFTER the dump, so every photo the dump names is in
#     the archive (files are written before their database row).
# Restore with: npm run restore -- <archive> [--into NAME] [--replace]
set -euo pipefail
source "$(dirname "$0")/env.sh"

SOCK_FILE="$BAYWALK_DATA_DIR/run/socket-path"
[ -f "$SOCK_FILE" ] || die "the private MariaDB has never started here ($SOCK_FILE is missing); run 'npm run db:up' first"
SOCK=$(cat "$SOCK_FILE")
mariadb-admin --no-defaults -S "$SOCK" -uroot ping >/dev/null 2>&1 || die "the private MariaDB is not running; start it with 'npm run db:up'"
DB="$BAYWALK_DB_NAME"
mariadb --no-defaults -S "$SOCK" -uroot -N -e "SELECT 1 FROM information_schema.schemata WHERE schema_name = '$DB'" | grep -q 1 \
  || die "there is no database named $DB to back up"

PHOTOS="${BAYWALK_PHOTOS_DIR:-$BAYWALK_DATA_DIR/photos}"
OUT_DIR="${BAYWALK_BACKUP_DIR:-$BAYWALK_DATA_DIR/backups}"
STAMP=$(date -u +%Y%m%dT%H%M%SZ)
ARCHIVE="$OUT_DIR/baywalk-$DB-$STAMP.tar.gz"
mkdir -p "$OUT_DIR"
WORK=$(mktemp -d "${TMPDIR:-/tmp}/baywalk-backup.XXXXXX")
trap 'rm -rf "$WORK"' EXIT

mariadb-dump --no-defaults -S "$SOCK" -uroot --single-transaction --quick --routines --triggers --hex-blob \
  --default-character-set=utf8mb4 "$DB" > "$WORK/database.sql" || die "mariadb-dump failed"
[ -d "$PHOTOS" ] || PHOTOS="$WORK/no-photos"
mkdir -p "$PHOTOS"
# Half-written uploads (*.part) are not photos yet.
PHOTO_COUNT=$(find "$PHOTOS" -type f ! -name '*.part' | wc -l)
TABLES=$(mariadb --no-defaults -S "$SOCK" -uroot -N -e "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = '$DB'")
cat > "$WORK/manifest.txt" <<MANIFEST
baywalk backup
database: $DB
tables: $TABLES
photos: $PHOTO_COUNT files
created: $STAMP
MANIFEST

# Written beside its final name, then renamed: a failed run never leaves a truncated archive.
tar -czf "$ARCHIVE.part" -C "$WORK" manifest.txt database.sql \
  --exclude='*.part' --transform 's,^\.,photos,' -C "$PHOTOS" . || { rm -f "$ARCHIVE.part"; die "could not write $ARCHIVE"; }
mv "$ARCHIVE.part" "$ARCHIVE"
say "backup of $DB ($TABLES tables, $PHOTO_COUNT photo files) written to $ARCHIVE"
