#!/usr/bin/env bash
# Starts the local stand-ins the app talks to in development (none yet beyond MariaDB).
set -euo pipefail
. "$(dirname "$0")/lib/common.sh"
exit 0
