#!/usr/bin/env bash
# The outside programs the export and report tests run for real, from Debian's packages: a minimal
# TeX system with TikZ (pdflatex), poppler-utils (pdftoppm) and Chromium (the report page in a real
# headless browser, driven by playwright-core with the installed browser). Whatever cannot be
# installed is reported as SKIPPED with the reason; the tests then print SKIPPED themselves.
set -uo pipefail
log=$(mktemp /tmp/hunch-ci-apt-XXXXXX.log)
want=()
command -v pdflatex >/dev/null || want+=(texlive-latex-base texlive-pictures)
command -v pdftoppm >/dev/null || want+=(poppler-utils)
[ -x /usr/bin/chromium ] || want+=(chromium)
if [ ${#want[@]} -gt 0 ]; then
  if [ "$(id -u)" != 0 ]; then
    echo "SKIPPED installing ${want[*]}: not root"
  else
    export DEBIAN_FRONTEND=noninteractive
    if ! apt-get update -qq >"$log" 2>&1; then
      echo "SKIPPED installing ${want[*]}: apt-get update failed: $(tail -1 "$log")"
    else
      for pkg in "${want[@]}"; do
        apt-get install -y -qq --no-install-recommends "$pkg" >>"$log" 2>&1 || echo "SKIPPED installing $pkg: $(tail -1 "$log")"
      done
    fi
  fi
fi
command -v pdflatex >/dev/null && echo "pdflatex: $(pdflatex --version | head -1)"
[ -x /usr/bin/chromium ] && echo "chromium: $(/usr/bin/chromium --version 2>/dev/null | head -1)"
rm -f "$log"
exit 0
