#!/usr/bin/python3
"""Validates the shipped examples against the JSON Schemas in docs/schema/.

    schema_test.py SOURCE_DIR PINPROOF_BINARY

For every catalog-examples/*.json: the file against the project schema, and
the output of `pinproof check FILE --json -` against the result schema. Then a
few deliberately broken copies of the first example must be refused by the
schema and by pinproof alike (exit code 2), so that the schema is not looser
than the reader in its structure.

Prints one line per case and a closing line "N passed, M failed"; the exit
code is non-zero when any case fails. Validator: python3-jsonschema (Debian
package), draft 2020-12.
"""
import copy
import glob
import json
import os
import subprocess
import sys
import tempfile


def main(argv):
    if len(argv) != 3:
        print("usage: schema_test.py SOURCE_DIR PINPROOF_BINARY")
        return 2
    source, binary = argv[1], argv[2]
    try:
        import jsonschema
    except ImportError:
        print("FAIL: the Python module jsonschema is missing; install the Debian package python3-jsonschema "
              "(bash setup.sh test installs it)")
        print("0 passed, 1 failed")
        return 1

    def load_schema(name):
        with open(os.path.join(source, "docs", "schema", name), encoding="utf-8") as f:
            schema = json.load(f)
        jsonschema.Draft202012Validator.check_schema(schema)
        return jsonschema.Draft202012Validator(schema)

    project_schema = load_schema("pinproof-project-1.schema.json")
    result_schema = load_schema("pinproof-result-1.schema.json")

    passed = failed = 0

    def report(ok, label, detail=""):
        nonlocal passed, failed
        if ok:
            passed += 1
        else:
            failed += 1
        print(("pass  " if ok else "FAIL  ") + label + (": " + detail if detail else ""))

    def first_error(validator, document):
        errors = sorted(validator.iter_errors(document), key=lambda e: list(e.absolute_path))
        if not errors:
            return None
        e = errors[0]
        return "/" + "/".join(str(p) for p in e.absolute_path) + ": " + e.message[:200]

    examples = sorted(glob.glob(os.path.join(source, "catalog-examples", "*.json")))
    if not examples:
        report(False, "catalog-examples", "no example files found")
    for path in examples:
        name = os.path.relpath(path, source)
        with open(path, encoding="utf-8") as f:
            document = json.load(f)
        err = first_error(project_schema, document)
        report(err is None, name + " against pinproof-project-1.schema.json", err or "")

        run = subprocess.run([binary, "check", path, "--json", "-"], capture_output=True, text=True)
        if run.returncode not in (0, 1):
            report(False, name + " result against pinproof-result-1.schema.json",
                   "pinproof exited with %d: %s" % (run.returncode, run.stderr.strip()[:300]))
            continue
        try:
            result = json.loads(run.stdout)
        except json.JSONDecodeError as e:
            report(False, name + " result against pinproof-result-1.schema.json", "not JSON: %s" % e)
            continue
        err = first_error(result_schema, result)
        report(err is None, name + " result against pinproof-result-1.schema.json", err or "")

    # Broken copies: each must be refused by the schema and by pinproof.
    if examples:
        with open(examples[0], encoding="utf-8") as f:
            base = json.load(f)

        def with_unknown_key(d):
            d["beams"][0]["spam"] = 1

        def without_span(d):
            del d["beams"][0]["span"]

        def bad_standard(d):
            d["standard"] = "EC3"

        def bad_stiffness_form(d):
            d["beams"][0]["joints"]["start"]["stiffness"] = {"min": "300 kN*m/rad"}

        def bad_load_key(d):
            d["beams"][0]["loads"][0]["P"] = "10 kN"

        for label, mutate in [("unknown key in a beam", with_unknown_key), ("missing span", without_span),
                              ("unknown standard", bad_standard), ("stiffness range without max", bad_stiffness_form),
                              ("udl with a point-load key", bad_load_key)]:
            broken = copy.deepcopy(base)
            mutate(broken)
            schema_refuses = first_error(project_schema, broken) is not None
            with tempfile.NamedTemporaryFile("w", suffix=".json", delete=False, encoding="utf-8") as tmp:
                json.dump(broken, tmp)
                tmp_path = tmp.name
            try:
                run = subprocess.run([binary, "check", tmp_path, "-q"], capture_output=True, text=True)
            finally:
                os.unlink(tmp_path)
            tool_refuses = run.returncode == 2
            detail = "" if schema_refuses and tool_refuses else \
                "schema %s, pinproof exit %d" % ("refuses" if schema_refuses else "accepts", run.returncode)
            report(schema_refuses and tool_refuses, "broken copy refused by schema and pinproof: " + label, detail)

    print("%d passed, %d failed" % (passed, failed))
    return 0 if failed == 0 else 1


if __name__ == "__main__":
    sys.exit(main(sys.argv))
