#!/bin/sh
# Executes docs/heater-notebook.ipynb headless with a Deno kernel registered under its own name
# (fluxwright-deno), so a kernel the user already has, such as "deno", is never overwritten;
# then checks the executed notebook's outputs (scripts/check-notebook.mjs). The Deno kernel
# occasionally loses a cell's last output line (a capture race); the check catches it and the
# notebook is run once more, saying so; a second incomplete run fails.
set -eu
cd "$(dirname "$0")/.."
kernel=fluxwright-deno
npx deno jupyter --install --name "$kernel" --display "Deno (fluxwright)" --force >/dev/null 2>&1
echo "notebook: using the Jupyter kernel \"$kernel\" (registered by this script; other kernels are left alone)" >&2
run() {
  NO_COLOR=1 PYDEVD_DISABLE_FILE_VALIDATION=1 jupyter nbconvert --to notebook --execute docs/heater-notebook.ipynb \
    --output-dir notebook-out --ExecutePreprocessor.timeout=300 --ExecutePreprocessor.kernel_name="$kernel"
}
run
if ! node scripts/check-notebook.mjs docs/heater-notebook.ipynb notebook-out/heater-notebook.ipynb; then
  echo "notebook: outputs incomplete; running it once more" >&2
  run
  node scripts/check-notebook.mjs docs/heater-notebook.ipynb notebook-out/heater-notebook.ipynb
fi
