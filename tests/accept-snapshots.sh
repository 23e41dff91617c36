#!/bin/sh
# Accepts every received snapshot left by a failed test run: renames *.received.txt to *.approved.txt.
# Read the diff the test printed first; a changed report is a changed calculation.
set -eu
cd "$(dirname "$0")"
find . -name '*.received.txt' | while read -r f; do
  mv "$f" "${f%.received.txt}.approved.txt"
  echo "accepted ${f%.received.txt}.approved.txt"
done
