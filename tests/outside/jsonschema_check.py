#!/usr/bin/python3
"""Checks YAML files against a JSON Schema with python3-jsonschema, an
implementation independent of forme.

    jsonschema_check.py SCHEMA            check SCHEMA against its metaschema
    jsonschema_check.py SCHEMA FILE...    validate each FILE against SCHEMA

Prints one line per file, "ok FILE" or "refused FILE: REASON", and exits 0
when every check ran (whatever the verdicts), 2 when something could not run.

YAML is read with the YAML 1.2 core schema's scalars (YAML 1.2.2 §10.3.2):
true/false are booleans, dates stay strings, yes/no/on/off stay strings.
That is also how yaml-cpp, which forme uses, types plain scalars.
"""
import re
import sys

import jsonschema
import yaml


class CoreLoader(yaml.SafeLoader):
    pass


CoreLoader.yaml_implicit_resolvers = {
    first: [(tag, rx) for tag, rx in resolvers
            if tag not in ("tag:yaml.org,2002:timestamp", "tag:yaml.org,2002:bool")]
    for first, resolvers in yaml.SafeLoader.yaml_implicit_resolvers.items()
}
CoreLoader.add_implicit_resolver(
    "tag:yaml.org,2002:bool",
    re.compile(r"^(?:true|True|TRUE|false|False|FALSE)$"),
    list("tTfF"))


def main(argv):
    if len(argv) < 2:
        print(__doc__, file=sys.stderr)
        return 2
    import json
    with open(argv[1], encoding="utf-8") as f:
        schema = json.load(f)
    validator_class = jsonschema.validators.validator_for(schema)
    if len(argv) == 2:
        try:
            validator_class.check_schema(schema)
        except jsonschema.exceptions.SchemaError as e:
            print(f"refused {argv[1]}: {e.message}")
            return 0
        print(f"ok {argv[1]} ({validator_class.__name__})")
        return 0
    validator = validator_class(schema)
    for path in argv[2:]:
        with open(path, encoding="utf-8") as f:
            doc = yaml.load(f, Loader=CoreLoader)
        errors = sorted(validator.iter_errors(doc), key=lambda e: list(e.absolute_path))
        if errors:
            where = "/".join(str(p) for p in errors[0].absolute_path)
            print(f"refused {path}: {where}: {errors[0].message}")
        else:
            print(f"ok {path}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
