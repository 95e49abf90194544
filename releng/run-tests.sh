#!/usr/bin/env bash
# Runs every Limen test on a fresh Debian machine: installs missing system packages (when run as root),
# starts a virtual display and a virtual sound device when there are none (and stops them by PID), then runs
# ./mvnw verify (plain JUnit 5 in the bundles, OSGi/UI tests under tycho-surefire, the product smoke test),
# then checks that regenerating the EMF model code gives no difference.
# Extra arguments go to Maven, e.g. releng/run-tests.sh -o -pl bundles/limen.fit -am
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
cd "$top"

packages=(xvfb xauth libgtk-3-0 x11-utils imagemagick xdotool sox pulseaudio pulseaudio-utils libasound2-plugins)
missing=()
for p in "${packages[@]}"; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p")
done
if [ ${#missing[@]} -gt 0 ]; then
  if [ "$(id -u)" -eq 0 ]; then
    echo "run-tests: installing ${missing[*]}" >&2
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq >/dev/null
    apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
  else
    echo "run-tests: missing system packages (run as root to install): ${missing[*]}" >&2
  fi
fi

pids=()
cleanup() {
  for pid in "${pids[@]}"; do kill "$pid" 2>/dev/null || true; done
  [ -n "${runtime_dir:-}" ] && rm -rf "$runtime_dir"
}
trap cleanup EXIT

# A display for the UI tests: reuse a working one, else start Xvfb on a free number.
if [ -z "${DISPLAY:-}" ] || ! xdpyinfo >/dev/null 2>&1; then
  for n in $(seq 90 120); do
    [ -e "/tmp/.X$n-lock" ] || [ -e "/tmp/.X11-unix/X$n" ] || { display=":$n"; break; }
  done
  Xvfb "$display" -screen 0 1280x1024x24 -nolisten tcp >/dev/null 2>&1 &
  pids+=($!)
  export DISPLAY="$display"
  for _ in $(seq 1 100); do xdpyinfo >/dev/null 2>&1 && break; sleep 0.1; done
  xdpyinfo >/dev/null 2>&1 || { echo "run-tests: Xvfb did not start on $DISPLAY" >&2; exit 1; }
  echo "run-tests: started Xvfb on $DISPLAY" >&2
fi

# A virtual sound device (PulseAudio null sink whose monitor can be recorded) for the audio tests.
if command -v pulseaudio >/dev/null 2>&1 && [ -z "${LIMEN_NO_PULSE:-}" ]; then
  runtime_dir=$(mktemp -d)
  chmod 700 "$runtime_dir"
  export XDG_RUNTIME_DIR="$runtime_dir"
  export PULSE_SERVER="unix:$runtime_dir/pulse/native"
  cat > "$runtime_dir/limen-test.pa" <<'PA'
load-module module-native-protocol-unix auth-anonymous=1
load-module module-null-sink sink_name=vsink format=s16le rate=48000 channels=2 norewinds=1
set-default-sink vsink
set-default-source vsink.monitor
PA
  pulseaudio -n -F "$runtime_dir/limen-test.pa" --daemonize=no --exit-idle-time=-1 --disallow-exit >"$runtime_dir/pulse.log" 2>&1 &
  pids+=($!)
  export LIMEN_PULSE_PID=$!
  for _ in $(seq 1 100); do pactl info >/dev/null 2>&1 && break; sleep 0.1; done
  if pactl info >/dev/null 2>&1; then
    export LIMEN_TEST_AUDIO=pulse
    echo "run-tests: started PulseAudio null sink (vsink)" >&2
  else
    echo "run-tests: PulseAudio did not start; audio loopback tests will say so" >&2
  fi
fi

"$top/mvnw" -B verify "$@"

# The checked-in EMF code must be exactly what the generator writes from the model.
if [ -z "${LIMEN_SKIP_MODEL_CHECK:-}" ]; then
  echo "run-tests: checking that regenerating the EMF model code gives no difference" >&2
  "$top/releng/regenerate-model.sh" check
fi
