#!/usr/bin/env bash
# The project's one test command (README "Run the tests"). It installs what the tests need, then runs them all.
set -euo pipefail
cd "$(dirname "$0")/.."
if ! command -v dotnet >/dev/null 2>&1; then
  echo "The .NET 10 SDK is required (dotnet on PATH)." >&2
  exit 1
fi
dotnet restore CanopyAdvisor.sln
dotnet build CanopyAdvisor.sln -c Release --no-restore
dotnet test CanopyAdvisor.sln -c Release --no-build --logger "console;verbosity=normal"
