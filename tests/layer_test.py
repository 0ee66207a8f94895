#!/usr/bin/env python3
"""The layer rule of DEVELOPERS.md: includes run one way only, downward.

    core <- model <- joints <- checks <- report <- batch <- cli
               ^
               io (beside model: it may include core and model, nothing above)

A file's layer is its folder: src/LAYER/, include/pinproof/LAYER/. Each layer may
include its own headers and those of the layers listed for it below. The test
fails, naming the file, the line and the header, when any include breaks the rule.
Usage: layer_test.py SOURCE_DIR
"""
import os
import re
import sys

ALLOWED = {
    "core": {"core"},
    "model": {"core", "model"},
    "io": {"core", "model", "io"},
    "joints": {"core", "model", "joints"},
    "checks": {"core", "model", "joints", "checks"},
    "report": {"core", "model", "joints", "checks", "report"},
    "batch": {"core", "model", "io", "joints", "checks", "report", "batch"},
    "cli": {"core", "model", "io", "joints", "checks", "report", "batch", "cli"},
    "bench": {"core", "model", "io", "joints", "checks", "report", "batch", "bench"},
}
INCLUDE = re.compile(r'^\s*#\s*include\s+"([^"]+)"')


def layer_of_path(rel):
    parts = rel.split("/")
    if parts[0] == "src" and len(parts) > 2:
        return parts[1]
    if parts[:2] == ["include", "pinproof"] and len(parts) > 3:
        return parts[2]
    return None


def layer_of_include(name, including_layer):
    parts = name.split("/")
    if parts[0] == "pinproof" and len(parts) == 3:
        return parts[1]
    if len(parts) == 2 and parts[0] in ALLOWED:   # internal header "model/detail_key.hpp"
        return parts[0]
    if len(parts) == 1:                           # a header beside the file
        return including_layer
    return "?"


def main():
    root = sys.argv[1]
    broken, files = [], 0
    for top in ("src", "include"):
        for dirpath, _, names in os.walk(os.path.join(root, top)):
            for n in sorted(names):
                if not n.endswith((".cpp", ".hpp")):
                    continue
                rel = os.path.relpath(os.path.join(dirpath, n), root)
                layer = layer_of_path(rel)
                if layer is None:
                    broken.append(f"{rel}: lies in no layer folder")
                    continue
                if layer not in ALLOWED:
                    broken.append(f"{rel}: unknown layer folder '{layer}'")
                    continue
                files += 1
                with open(os.path.join(root, rel), encoding="utf-8") as f:
                    for lineno, line in enumerate(f, 1):
                        m = INCLUDE.match(line)
                        if not m:
                            continue
                        target = layer_of_include(m.group(1), layer)
                        if target not in ALLOWED[layer]:
                            broken.append(f'{rel}:{lineno}: the {layer} layer includes "{m.group(1)}" '
                                          f"of the {target} layer; {layer} may include only "
                                          f"{', '.join(sorted(ALLOWED[layer]))}")
    for b in broken:
        print(b)
    print(f"layers: {files} files read, {len(broken)} includes against the rule")
    return 1 if broken or files == 0 else 0


if __name__ == "__main__":
    sys.exit(main())
