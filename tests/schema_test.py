#!/usr/bin/python3
"""Validates the shipped examples against the JSON Schemas in docs/schema/.

    schema_test.py SOURCE_DIR PINPROOF_BINARY

Every file in catalog-examples/ is taken by its "format" value:
  pinproof-project/1  the file against the project schema, and the output of
                      `pinproof check FILE --json -` against the result schema
                      (exit 0 or 1: a verdict that does not hold is a result too;
                      2 is a failure);
  pinproof-details/1  the file against the detail catalogue schema.
Files that are not JSON (the CSV schedule) are skipped with a printed line.

Then a project that uses the keys no example uses (a joint given as a detail
id of the example catalogue, a stiffness distribution, a support rotation,
stiffness_correlation) is checked the same way, and deliberately broken copies
of a project example must be refused by the schema and by pinproof alike
(exit code 2), so that the schema is not looser than the reader in its
structure.

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

PROJECT_FORMAT = "pinproof-project/1"
DETAILS_FORMAT = "pinproof-details/1"


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
    details_schema = load_schema("pinproof-details-1.schema.json")

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

    def check_result(name, path, extra=()):
        """Runs `pinproof check PATH --json -` and validates its output."""
        label = name + " result against pinproof-result-1.schema.json"
        run = subprocess.run([binary, "check", path, "--json", "-", *extra], capture_output=True, text=True)
        if run.returncode not in (0, 1):
            report(False, label, "pinproof exited with %d: %s" % (run.returncode, run.stderr.strip()[:300]))
            return None
        try:
            result = json.loads(run.stdout)
        except json.JSONDecodeError as e:
            report(False, label, "not JSON: %s" % e)
            return None
        err = first_error(result_schema, result)
        report(err is None, label, err or "")
        return result

    examples = sorted(p for p in glob.glob(os.path.join(source, "catalog-examples", "*")) if os.path.isfile(p))
    projects, catalogues = [], []
    for path in examples:
        name = os.path.relpath(path, source)
        try:
            with open(path, encoding="utf-8") as f:
                document = json.load(f)
        except (json.JSONDecodeError, UnicodeDecodeError):
            if path.endswith(".json"):
                report(False, name, "a .json example that is not valid JSON")
            else:
                print("skip  " + name + ": not a JSON file")
            continue
        fmt = document.get("format") if isinstance(document, dict) else None
        if fmt == PROJECT_FORMAT:
            err = first_error(project_schema, document)
            report(err is None, name + " against pinproof-project-1.schema.json", err or "")
            check_result(name, path)
            projects.append((path, document))
        elif fmt == DETAILS_FORMAT:
            err = first_error(details_schema, document)
            report(err is None, name + " against pinproof-details-1.schema.json", err or "")
            catalogues.append((path, document))
        else:
            report(False, name, "unknown format %r (expected %s or %s)" % (fmt, PROJECT_FORMAT, DETAILS_FORMAT))
    if not projects:
        report(False, "catalog-examples", "no project example found")

    with tempfile.TemporaryDirectory() as tmp:

        def write(document, name):
            path = os.path.join(tmp, name)
            with open(path, "w", encoding="utf-8") as f:
                json.dump(document, f)
            return path

        # The keys that no example uses: a joint as a detail id, a distribution.
        if catalogues:
            catalogue_path, catalogue = catalogues[0]
            entry = next((e for e in catalogue["details"] if "geometry" in e), catalogue["details"][0])
            synthetic = {
                "format": PROJECT_FORMAT,
                "title": "Schema test: detail id, stiffness distribution",
                "standard": "EN1993-1-8",
                "frame": "braced",
                "details": os.path.abspath(catalogue_path),
                "beams": [{
                    "id": "S1", "span": "6 m", "section": "IPE 300",
                    "stiffness_correlation": 0,
                    "loads": [{"case": "G", "kind": "udl", "w": "12 kN/m"},
                              {"case": "Q", "kind": "udl", "w": "9 kN/m"}],
                    "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35, "Q": 1.5}},
                                     {"name": "SLS", "use": "service", "factors": {"G": 1.0, "Q": 1.0}}],
                    "joints": {
                        "start": entry["id"],
                        "end": {"stiffness_distribution": {"kind": "lognormal", "median": "0.3 EI/L", "cov": 0.6},
                                "support_rotation": "1 mrad", "description": "inline, by distribution only",
                                "notes": {"any": ["value"]}}},
                    "limits": {"deflection": "span/360"}}]}
            name = "project with a detail id and a stiffness distribution"
            err = first_error(project_schema, synthetic)
            report(err is None, name + " against pinproof-project-1.schema.json", err or "")
            result = check_result(name, write(synthetic, "synthetic.json"))
            if result is not None:
                beam = result["beams"][0]
                ok = beam["joints"]["end"]["detail"] is None and beam["sensitivity"]["stiffness_correlation"] == 0 \
                    and len(beam["sensitivity"]["probability"]) > 0
                report(ok, name + ": distribution and correlation reach the result",
                       "" if ok else json.dumps(beam["sensitivity"])[:300])
            # The same file with the catalogue named on the command line instead.
            by_option = copy.deepcopy(synthetic)
            del by_option["details"]
            check_result(name + " (--details)", write(by_option, "by_option.json"),
                         ("--details", os.path.abspath(catalogue_path)))
        else:
            print("skip  project with a detail id: no pinproof-details/1 example")

        # Broken copies: each must be refused by the schema and by pinproof.
        # The base is the first project example on two supports with inline joints and a udl first.
        base = None
        for _, document in projects:
            b = document["beams"][0]
            if isinstance(b["joints"]["start"], dict) and b["loads"][0].get("kind") == "udl" and "details" not in document \
                    and b.get("layout", "two-supports") == "two-supports":
                base = document
                break
        if base is None:
            report(False, "broken copies", "no project example with inline joints and a udl as its first load")
            base = {}

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

        def partial_correlation(d):
            d["beams"][0]["stiffness_correlation"] = 0.5

        def distribution_both_forms(d):
            d["beams"][0]["joints"]["start"]["stiffness_distribution"] = {
                "kind": "lognormal", "median": "1000 kN*m/rad", "cov": 0.5, "p05": "500 kN*m/rad"}

        def closure_flag_not_boolean(d):
            d["beams"][0]["joints"]["end"]["designed_for_closure"] = "yes"

        def end_plate_with_gap(d):
            d["beams"][0]["joints"]["start"]["detail"] = {"type": "end-plate", "gap": "10 mm"}

        def beam_web_without_supporting_beam(d):
            d["beams"][0]["joints"]["start"]["detail"] = {"type": "fin-plate", "support": "beam-web"}

        def span_beyond_plausible(d):
            d["beams"][0]["span"] = 5000

        cases = [("unknown key in a beam", with_unknown_key), ("missing span", without_span),
                 ("unknown standard", bad_standard), ("stiffness range without max", bad_stiffness_form),
                 ("udl with a point-load key", bad_load_key), ("stiffness_correlation 0.5", partial_correlation),
                 ("lognormal by median and by fractiles at once", distribution_both_forms),
                 ("designed_for_closure not a boolean", closure_flag_not_boolean),
                 ("end-plate detail with a gap", end_plate_with_gap),
                 ("beam-web support without supporting_beam", beam_web_without_supporting_beam),
                 ("span of 5000 m", span_beyond_plausible)]
        for label, mutate in cases if base else []:
            broken = copy.deepcopy(base)
            mutate(broken)
            schema_refuses = first_error(project_schema, broken) is not None
            run = subprocess.run([binary, "check", write(broken, "broken.json"), "-q"], capture_output=True, text=True)
            tool_refuses = run.returncode == 2
            detail = "" if schema_refuses and tool_refuses else \
                "schema %s, pinproof exit %d" % ("refuses" if schema_refuses else "accepts", run.returncode)
            report(schema_refuses and tool_refuses, "broken copy refused by schema and pinproof: " + label, detail)

    print("%d passed, %d failed" % (passed, failed))
    return 0 if failed == 0 else 1


if __name__ == "__main__":
    sys.exit(main(sys.argv))
