"""Fails when openapi-python-client warned about anything but the known limitation.

Usage: python generator_warnings.py GENERATOR_OUTPUT

openapi-python-client 0.29 writes request bodies of JSON, form, multipart and octet-stream media
types only (see its parser/bodies.py). POST /v1/clock/proper-time also takes an ephemeris as CCSDS
OEM, SP3 or plain text, which the document describes correctly (a string body per media type);
the generator skips those three bodies and keeps the JSON one. Any other warning (or error) is a
finding about the document: fix it in the utoipa annotations, not here.
"""

import re
import sys

KNOWN = {
    ("POST /v1/clock/proper-time", "Unsupported content type application/ccsds-oem"),
    ("POST /v1/clock/proper-time", "Unsupported content type application/sp3"),
    ("POST /v1/clock/proper-time", "Unsupported content type text/plain"),
}

BLOCK = re.compile(r"^WARNING parsing (\S+ \S+) within \S+\.\n\n(.+)$", re.MULTILINE)
ALARM = re.compile(r"^(WARNING|ERROR|Unable|Cannot|Invalid|Skipping|Failed)", re.MULTILINE)


def main() -> int:
    text = open(sys.argv[1], encoding="utf-8").read()
    found = {(m.group(1), m.group(2).strip()) for m in BLOCK.finditer(text)}
    blocks = len(BLOCK.findall(text))
    alarms = len(ALARM.findall(text))
    unknown = sorted(found - KNOWN)
    if unknown or alarms != blocks or ("Warning(s) encountered" in text and not found):
        print(text)
        for operation, detail in unknown:
            print(f"client: generator warning on {operation}: {detail}")
        print("client: the generator reported problems with openapi/openapi.json (above)")
        return 1
    for operation, detail in sorted(found):
        print(f"client: known generator limitation on {operation}: {detail}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
