#!/usr/bin/env bash
# Installs the Debian packages the tests use as independent references, when it can (root + apt-get);
# otherwise fails and says exactly what to install. It never lets a test be skipped for a missing tool.
set -euo pipefail

# command -> Debian package that provides it
declare -A NEEDED=(
  [chromium]=chromium
  [ogrinfo]=gdal-bin
  [cs2cs]=proj-bin
  [pdftotext]=poppler-utils
)
missing=()
for cmd in "${!NEEDED[@]}"; do
  command -v "$cmd" >/dev/null 2>&1 || missing+=("${NEEDED[$cmd]}")
done
# python3-shapely installs into Debian's own python3, which another python3 on PATH may hide.
/usr/bin/python3 -c "import shapely" >/dev/null 2>&1 || python3 -c "import shapely" >/dev/null 2>&1 || missing+=(python3-shapely)

if [ ${#missing[@]} -eq 0 ]; then
  exit 0
fi

echo "Test tools missing: ${missing[*]}"
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
  echo "Installing them from Debian's packages…"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
  exit 0
fi

echo "Install them first, for example: sudo apt-get install -y ${missing[*]}" >&2
exit 1
