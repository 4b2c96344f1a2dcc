#!/usr/bin/env bash
# SPDX-License-Identifier: MPL-2.0
# ctest `tools_deps`: tools/deps never makes apt remove a package, and takes
# whichever Calc is installed. Runs tools/deps against stand-ins for
# dpkg-query and apt-get (on PATH first), so nothing is installed for real.
set -uo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)
T=$(mktemp -d); trap 'rm -rf "$T"' EXIT
fails=0; passes=0
check() { if eval "$2"; then passes=$((passes+1)); else echo "FAIL: $1"; fails=$((fails+1)); fi; }

# Stand-ins: $T/installed lists the "installed" packages; $T/plan is what
# `apt-get install -s` prints; every apt-get call is logged to $T/apt.log.
cat >"$T/dpkg-query" <<'SH'
#!/bin/sh
pkg=$(eval echo \${$#})
grep -qx "$pkg" "$STUB/installed" && printf 'install ok installed' && exit 0
exit 1
SH
cat >"$T/apt-get" <<'SH'
#!/bin/sh
echo "apt-get $*" >>"$STUB/apt.log"
case " $* " in *" -s "*) cat "$STUB/plan";; esac
exit 0
SH
printf '#!/bin/sh\nexec "$@"\n' >"$T/sudo"  # as a normal user: no real sudo either
chmod +x "$T/dpkg-query" "$T/apt-get" "$T/sudo"
all="cmake g++ make libboost-dev libgtest-dev libbenchmark-dev libreoffice-dev python3 python3-uno zip poppler-utils util-linux locales python3-iapws zlib1g-dev libexpat1-dev"
run() { STUB=$T PATH="$T:$PATH" bash "$ROOT/tools/deps" >"$T/out" 2>&1; echo $?; }

# 1. The desktop Calc is installed, one build package is missing: the
#    headless Calc is not asked for, and the install runs with --no-remove.
printf '%s\n' $all | grep -vx cmake >"$T/installed"; echo libreoffice-calc >>"$T/installed"
: >"$T/plan"; : >"$T/apt.log"
rc=$(run)
check "desktop Calc: exit 0 (got $rc)" '[ "$rc" = 0 ]'
check "desktop Calc: nogui not requested" '! grep -q "calc-nogui" "$T/apt.log"'
check "desktop Calc: cmake installed with --no-remove" 'grep -q "install -y -q --no-install-recommends --no-remove cmake" "$T/apt.log"'

# 2. No Calc at all: the headless one is installed.
printf '%s\n' $all >"$T/installed"; : >"$T/apt.log"
rc=$(run)
check "no Calc: exit 0 (got $rc)" '[ "$rc" = 0 ]'
check "no Calc: nogui installed" 'grep -q "no-remove libreoffice-calc-nogui" "$T/apt.log"'

# 3. The plan would remove a package: stop, say which, install nothing.
printf 'Inst cmake (3.25)\nRemv libreoffice-calc [4:7.4.7]\n' >"$T/plan"
printf '%s\n' $all | grep -vx cmake >"$T/installed"; echo libreoffice-calc-nogui >>"$T/installed"; : >"$T/apt.log"
rc=$(run)
check "removal planned: exit 1 (got $rc)" '[ "$rc" = 1 ]'
check "removal planned: names the package" 'grep -q "REMOVE these installed packages: libreoffice-calc" "$T/out"'
check "removal planned: no real install" '! grep -q "install -y" "$T/apt.log"'

# 4. Everything installed: apt is not called at all.
printf '%s\n' $all libreoffice-calc-nogui >"$T/installed"; : >"$T/apt.log"
rc=$(run)
check "all installed: exit 0 (got $rc)" '[ "$rc" = 0 ]'
check "all installed: apt not called" '[ ! -s "$T/apt.log" ]'

echo "$passes passed, $fails failed"
[ "$fails" = 0 ]
