#!/usr/bin/env bash
# The project's one test command (README "Run the tests"). It installs what the tests need, then runs them all.
# The tests need the .NET SDK, NuGet packages (restored below) and Debian's Chromium for the browser tests (installed
# below when missing); the sun-position reference table in tests/reference/ is committed, so PyEphem is needed only to
# regenerate it (DEVELOPERS.md).
set -euo pipefail
cd "$(dirname "$0")/.."
if ! command -v dotnet >/dev/null 2>&1; then
  echo "The .NET 10 SDK is required (dotnet on PATH)." >&2
  exit 1
fi
# The browser tests (tests/CanopyAdvisor.Browser.Tests) drive Debian's Chromium through Playwright, which cannot download
# its own browsers here: install the distribution's `chromium` package when /usr/bin/chromium is missing (CI runs as
# root; quiet and non-interactive).
if [ ! -x /usr/bin/chromium ]; then
  echo "Installing Debian's chromium for the browser tests..."
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq chromium >/dev/null
fi
log=$(mktemp)
trap 'rm -f "$log"' EXIT
dotnet restore CanopyAdvisor.sln
dotnet build CanopyAdvisor.sln -c Release --no-restore
set +e
dotnet test CanopyAdvisor.sln -c Release --no-build --logger "console;verbosity=minimal" 2>&1 | tee "$log"
status=${PIPESTATUS[0]}
set -e
# One closing line over all test projects, in the plain "N passed, N failed" form.
awk '/(Passed|Failed)!  - /{
       for (i = 1; i <= NF; i++) {
         if ($i == "Failed:") f += $(i+1); if ($i == "Passed:") p += $(i+1); if ($i == "Skipped:") s += $(i+1)
       }
     } END { gsub(/,/, "", p); printf "Tests: %d passed, %d failed, %d skipped\n", p, f, s }' "$log"
exit "$status"
