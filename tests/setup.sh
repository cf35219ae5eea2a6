#!/usr/bin/env bash
# Installs what the tests need besides the .NET SDK: Debian's chromium (the report's browser test, driven by
# Playwright without a browser download) and DejaVu Sans with fontconfig (map and chart text measurement).
# Installs them with apt-get when run as root; otherwise says in one line what to install, and fails.
set -uo pipefail

missing=()
[ -x /usr/bin/chromium ] || missing+=(chromium)
[ -f /usr/share/fonts/truetype/dejavu/DejaVuSans.ttf ] || missing+=(fonts-dejavu-core)
ldconfig -p 2>/dev/null | grep -q libfontconfig.so.1 || missing+=(fontconfig)
[ ${#missing[@]} -eq 0 ] && exit 0

if [ "$(id -u)" -eq 0 ] && command -v apt-get >/dev/null; then
  echo "installing ${missing[*]} for the tests"
  (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null) \
    || { echo "could not install ${missing[*]}"; exit 1; }
  exit 0
fi

echo "the tests need ${missing[*]}: run 'sudo apt-get install -y ${missing[*]}' (or your system's packages for chromium, DejaVu Sans and fontconfig), then run the tests again"
exit 1
