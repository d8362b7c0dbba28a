"""A notebook-style script: runs every pondus command with --json and --csv and reads the rows
back with the standard library, as a Python notebook would. Run from the project folder after
`npm ci`:  python3 examples/notebook/read_every_command.py
"""
import csv
import io
import json
import pathlib
import subprocess

here = pathlib.Path(__file__).parent
commands = json.loads((here / "commands.json").read_text(encoding="utf-8"))


def run(args):
    # exit 1 means some input failed; its row is in the output like the others
    done = subprocess.run(["node", "bin/pondus.cjs", *args], capture_output=True, text=True, encoding="utf-8")
    return done.stdout


for args in commands:
    rows = [json.loads(line) for line in run(args + ["--json"]).splitlines() if line]
    table = list(csv.DictReader(io.StringIO(run(args + ["--csv"]))))
    ok = [r for r in rows if "error" not in r]
    notes = sum(len(r["notes"]) for r in ok)
    columns = list(table[0].keys()) if table else []
    print(f"{args[0]:<13} json: {len(rows)} row(s), {len(ok)} ok, {notes} note(s)  "
          f"csv: {len(table)} row(s) x {len(columns)} columns, notes column: {'notes' in columns}")
