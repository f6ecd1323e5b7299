"""The office's process and its memory as /proc shows it (Linux): for the tests and benchmarks that
record what the office holds (tests/benchmarks/RESULTS.md)."""

import os


def office_process(office):
    """The soffice.bin process of the office's process group."""
    for name in os.listdir("/proc"):
        if not name.isdigit():
            continue
        try:
            if os.getpgid(int(name)) != office.pgid:
                continue
            with open("/proc/%s/comm" % name) as handle:
                if handle.read().strip() == "soffice.bin":
                    return int(name)
        except (OSError, ProcessLookupError):
            continue
    raise RuntimeError("soffice.bin not found")


def memory_mb(pid, field):
    """A memory figure of /proc/<pid>/status in MB: "VmRSS" (resident now), "VmHWM" (its peak)."""
    with open("/proc/%d/status" % pid) as handle:
        for line in handle:
            if line.startswith(field + ":"):
                return int(line.split()[1]) / 1024.0
    raise RuntimeError(field + " not found")


def minor_faults(pid):
    """The minor page faults of the process so far (/proc/<pid>/stat, field 10): each one a fresh
    page the kernel had to supply."""
    with open("/proc/%d/stat" % pid) as handle:
        after_name = handle.read().rsplit(")", 1)[1].split()
    return int(after_name[7])
