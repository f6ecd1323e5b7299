"""The command line of a script that opens a headless office with the extension (the sample
workbooks' generator, the demo)."""

import argparse
import os


def extension_and_output(description, output_help, output_default=None):
    """Parses --extension (the .oxt to install) and --output (a folder, made when missing; required
    unless output_default is given)."""
    parser = argparse.ArgumentParser(description=description)
    parser.add_argument("--extension", required=True, help="path to isoquant.oxt")
    parser.add_argument("--output", required=output_default is None, default=output_default, help=output_help)
    arguments = parser.parse_args()
    os.makedirs(arguments.output, exist_ok=True)
    return arguments
