"""A throw-away headless LibreOffice for integration tests, sample workbooks and demos.

Run with /usr/bin/python3: Debian's UNO bridge (python3-uno) imports only there.

    with HeadlessOffice(extension_path="build/isoquant.oxt") as office:
        doc = office.new_calc()
        sheet = doc.Sheets.getByIndex(0)
        set_values(sheet, "A1", [[1, 2], [3, None]])
        set_formula(sheet, "C1", "=SUM(A1:B2)")
        print(get_cell(sheet, "C1"))   # 6.0

Formulas go through the UNO API grammar (XCell.setFormula, setArrayFormula):
English function names, '.' as decimal point and ';' as the argument separator,
"=ROUND(A1;2)". Observed in 7.4: ',' is no separator there; "=ROUND(1,2)" and
"=SUM(1,2)" give #NAME?. Inline arrays use ';' between columns and '|' between
rows, "={1;2|3;4}" ("{1,2;3,4}" gives Err:539). The range intersection operator
is '!' ("A1:B2!B2:C3"; a space gives Err:509). getFormula() answers in the same
grammar; an add-in function comes back as "<SERVICE NAME>.<METHOD>(...)" in
capitals (e.g. "=ORG.EXAMPLE.PROBE.PROBE.PROBETWICE(21)").
"""

import atexit
import os
import shutil
import signal
import socket
import subprocess
import tempfile
import threading
import time

import uno
import unohelper
from com.sun.star.beans import PropertyValue
from com.sun.star.connection import NoConnectException
from com.sun.star.task import XInteractionHandler
from com.sun.star.ucb import XCommandEnvironment, XProgressHandler

SOFFICE_CANDIDATES = ("/usr/bin/soffice", "/usr/lib/libreoffice/program/soffice")

# Calc's error codes (cell.getError()) and the text a cell shows for them; codes not
# listed show as "Err:<code>" (e.g. 502, 504, 509, 511, 520, 522, 539 seen in 7.4).
# All checked against the office's own display text except 521, which could not be
# provoked through the API (an empty intersection gave #REF!).
ERROR_TEXT = {
    503: "#NUM!",
    519: "#VALUE!",
    521: "#NULL!",
    524: "#REF!",
    525: "#NAME?",
    532: "#DIV/0!",
    32767: "#N/A",
}

# com.sun.star.sheet.FormulaResult flags, as reported by a cell's FormulaResultType2.
_RESULT_STRING = 2
_RESULT_ERROR = 4


def skip_missing_reference(test_case, what):
    """Ends the calling (sub)test because a reference library (python3-statsmodels, -scipy, numpy) is
    missing: skipped, or failed under ISOQUANT_REQUIRE_REFERENCES=1 (the CMake option of that name
    sets it), so that a run without the libraries cannot pass having checked only counts and layout."""
    if os.environ.get("ISOQUANT_REQUIRE_REFERENCES") == "1":
        test_case.fail("%s, and ISOQUANT_REQUIRE_REFERENCES=1 requires them" % what)
    test_case.skipTest("%s: reference checks skipped" % what)


def error_text(code):
    """The text Calc shows for an error code, e.g. 504 -> "Err:504", 525 -> "#NAME?"."""
    return ERROR_TEXT.get(code, "Err:%d" % code)


def find_soffice():
    for path in SOFFICE_CANDIDATES:
        if os.access(path, os.X_OK):
            return path
    raise FileNotFoundError("soffice not found in %s" % (SOFFICE_CANDIDATES,))


def _free_port():
    # The port is released again before the office binds it: a small race, acceptable here.
    with socket.socket(socket.AF_INET, socket.SOCK_STREAM) as s:
        s.bind(("127.0.0.1", 0))
        return s.getsockname()[1]


def _props(**values):
    result = []
    for name, value in values.items():
        prop = PropertyValue()
        prop.Name = name
        prop.Value = value
        result.append(prop)
    return tuple(result)


def _with_timeout(func, seconds, what):
    """Run func() in a daemon thread; raise TimeoutError if it has not returned in time.

    UNO calls have no timeout of their own, and an office that stopped answering must
    not hang the caller. A call left running ends when the office is killed."""
    outcome = {}

    def run():
        try:
            outcome["value"] = func()
        except BaseException as exc:  # handed back to the caller below
            outcome["error"] = exc

    thread = threading.Thread(target=run, name="uno-call: " + what, daemon=True)
    thread.start()
    thread.join(seconds)
    if thread.is_alive():
        raise TimeoutError("%s did not answer within %.0f s" % (what, seconds))
    if "error" in outcome:
        raise outcome["error"]
    return outcome.get("value")


class _ProgressHandler(unohelper.Base, XProgressHandler):
    def push(self, status):
        pass

    def update(self, status):
        pass

    def pop(self):
        pass


class _ApprovingInteractionHandler(unohelper.Base, XInteractionHandler):
    """Answers every question the extension manager asks (install?, license, replace an
    older version, ...) by approving it, so nothing waits for a dialog that headless
    can't show. .answers records the continuation chosen for each question.

    The request itself is not read: in this pyuno (7.4, Python 3.11) request.getRequest()
    fails with SystemError ("AttributeError: args") when it converts the exception
    value to Python."""

    # Best first: approve a question; failing that, abort rather than hang.
    _PREFERENCE = (
        "com.sun.star.task.XInteractionApprove",
        "com.sun.star.task.XInteractionRetry",
        "com.sun.star.task.XInteractionAbort",
    )

    def __init__(self):
        self.answers = []

    def handle(self, request):
        continuations = request.getContinuations()
        for type_name in self._PREFERENCE:
            wanted = uno.getTypeByName(type_name)
            for continuation in continuations:
                if continuation.queryInterface(wanted) is not None:
                    self.answers.append(type_name.rsplit(".", 1)[-1])
                    continuation.select()
                    return
        if continuations:
            self.answers.append("first of %d" % len(continuations))
            continuations[0].select()


class _CommandEnvironment(unohelper.Base, XCommandEnvironment):
    def __init__(self):
        self.interaction_handler = _ApprovingInteractionHandler()
        self.progress_handler = _ProgressHandler()

    def getInteractionHandler(self):
        return self.interaction_handler

    def getProgressHandler(self):
        return self.progress_handler


# Offices still running when the interpreter exits (e.g. the with-block was never left
# normally); killed by _kill_leftovers so no soffice outlives the tests.
_running = set()


def _kill_leftovers():
    for office in list(_running):
        office._kill()
        office._remove_workdir()


atexit.register(_kill_leftovers)


class HeadlessOffice:
    """Context manager: a private headless office on a throw-away profile.

    Attributes while inside the with-block: context, service_manager, desktop,
    workdir (temp folder with profile/, tmp/ and office.log), log_path, port,
    pgid (the office's process group), extension_answers (how each question asked
    while installing the extension was answered, e.g. ["XInteractionApprove"])."""

    START_TIMEOUT = 60.0  # start to connected is ~3-4 s; the first start of a profile is slower
    STOP_TIMEOUT = 10.0
    CALL_TIMEOUT = 30.0

    def __init__(self, extension_path=None, keep_profile=False):
        self.extension_path = extension_path
        self.keep_profile = keep_profile
        self.workdir = None
        self.log_path = None
        self.port = None
        self.pgid = None
        self.context = None
        self.service_manager = None
        self.desktop = None
        self.extension_answers = []
        self._proc = None
        self._log = None

    # -- lifecycle -------------------------------------------------------

    def __enter__(self):
        if self.extension_path is not None and not os.path.isfile(self.extension_path):
            raise FileNotFoundError("extension not found: %s" % self.extension_path)
        self.workdir = tempfile.mkdtemp(prefix="isoquant-office-")
        self.log_path = os.path.join(self.workdir, "office.log")
        os.mkdir(os.path.join(self.workdir, "tmp"))
        try:
            self._start()
            if self.extension_path is not None:
                self._install_extension(self.extension_path)
                # The platform notes found a C++ add-in computes only after a restart
                # (a throw-away Python add-in computed at once): always restart.
                self._stop()
                self._start()
        except BaseException:
            self._stop()
            self._remove_workdir()
            raise
        return self

    def __exit__(self, exc_type, exc, tb):
        self._stop()
        self._remove_workdir()
        return False

    def _start(self):
        soffice = find_soffice()
        self.port = _free_port()
        profile_url = uno.systemPathToFileUrl(os.path.join(self.workdir, "profile"))
        args = [
            soffice,
            "--headless", "--invisible", "--norestore", "--nologo", "--nodefault",
            "--nolockcheck",
            "--accept=socket,host=127.0.0.1,port=%d;urp;StarOffice.ComponentContext" % self.port,
            "-env:UserInstallation=" + profile_url,
        ]
        # TMPDIR and XDG_CACHE_HOME inside workdir: the office then writes nothing outside
        # it (otherwise it creates e.g. ~/.cache/dconf/user). soffice.bin also loads a JVM
        # at start; -XX:-UsePerfData stops it leaving /tmp/hsperfdata_<user>/<pid> when killed.
        java_options = (os.environ.get("JAVA_TOOL_OPTIONS", "") + " -XX:-UsePerfData").strip()
        env = dict(os.environ, TMPDIR=os.path.join(self.workdir, "tmp"),
                   XDG_CACHE_HOME=os.path.join(self.workdir, "cache"),
                   JAVA_TOOL_OPTIONS=java_options)
        self._log = open(self.log_path, "ab")
        self._proc = subprocess.Popen(
            args, stdin=subprocess.DEVNULL, stdout=self._log, stderr=subprocess.STDOUT,
            env=env, start_new_session=True)  # own process group: killed as a whole
        self.pgid = self._proc.pid
        _running.add(self)
        self._connect()

    def _connect(self):
        local = uno.getComponentContext()
        resolver = local.ServiceManager.createInstanceWithContext(
            "com.sun.star.bridge.UnoUrlResolver", local)
        url = "uno:socket,host=127.0.0.1,port=%d;urp;StarOffice.ComponentContext" % self.port
        deadline = time.monotonic() + self.START_TIMEOUT
        while True:
            if self._proc.poll() is not None:
                raise RuntimeError("soffice exited with %s before accepting a connection; log:\n%s"
                                   % (self._proc.returncode, self.log_tail()))
            try:
                left = max(1.0, deadline - time.monotonic())
                self.context = _with_timeout(lambda: resolver.resolve(url), left, "connect")
                break
            except NoConnectException:
                if time.monotonic() > deadline:
                    raise TimeoutError("soffice did not accept a connection within %.0f s; log:\n%s"
                                       % (self.START_TIMEOUT, self.log_tail()))
                time.sleep(0.2)
        self.service_manager = self._call(lambda: self.context.ServiceManager, "ServiceManager")
        self.desktop = self._call(lambda: self.service_manager.createInstanceWithContext(
            "com.sun.star.frame.Desktop", self.context), "create Desktop")

    def _install_extension(self, path):
        url = uno.systemPathToFileUrl(os.path.abspath(path))
        manager = self._call(lambda: self.context.getValueByName(
            "/singletons/com.sun.star.deployment.ExtensionManager"), "get ExtensionManager")
        env = _CommandEnvironment()
        abort = self._call(manager.createAbortChannel, "createAbortChannel")
        # A command environment is required: with None, addExtension raises
        # DeploymentException ("Error while adding: ...") even for a trivial extension.
        package = self._call(lambda: manager.addExtension(url, (), "user", abort, env),
                             "addExtension", timeout=120.0)
        if package is None:
            raise RuntimeError("addExtension returned nothing for " + path)
        self.extension_answers = list(env.interaction_handler.answers)

    def _stop(self):
        """Terminate politely, then kill the whole process group; never waits unbounded."""
        if self._proc is None:
            return
        deadline = time.monotonic() + self.STOP_TIMEOUT
        if self._proc.poll() is None and self.desktop is not None:
            try:
                _with_timeout(self._close_and_terminate, self.STOP_TIMEOUT, "terminate")
            except Exception:
                pass  # the office is killed below anyway
            try:
                self._proc.wait(max(0.1, deadline - time.monotonic()))
            except subprocess.TimeoutExpired:
                pass
        self._kill()

    def _close_and_terminate(self):
        # close(True) discards changes without asking; an open modified document could
        # otherwise veto terminate().
        components = self.desktop.getComponents().createEnumeration()
        while components.hasMoreElements():
            component = components.nextElement()
            try:
                component.close(True)
            except Exception:
                pass
        try:
            self.desktop.terminate()
        except Exception:
            pass  # the bridge goes away while terminate() is answered: expected

    def _kill(self):
        proc = self._proc
        if proc is None:
            return
        try:
            os.killpg(self.pgid, signal.SIGKILL)
        except ProcessLookupError:
            pass
        try:
            proc.wait(5)
        except subprocess.TimeoutExpired:
            pass
        # Children (soffice.bin) may outlive the leader for a moment.
        deadline = time.monotonic() + 5
        while time.monotonic() < deadline and self.group_alive():
            time.sleep(0.05)
        if self._log is not None:
            self._log.close()
            self._log = None
        self._proc = None
        self.context = self.service_manager = self.desktop = None
        _running.discard(self)

    def _remove_workdir(self):
        if self.workdir and not self.keep_profile:
            shutil.rmtree(self.workdir, ignore_errors=True)

    def _call(self, func, what, timeout=None):
        return _with_timeout(func, timeout or self.CALL_TIMEOUT, what)

    # -- queries ---------------------------------------------------------

    def group_alive(self):
        """True while any process of the office's process group exists (zombies count)."""
        if self.pgid is None:
            return False
        try:
            os.killpg(self.pgid, 0)
            return True
        except ProcessLookupError:
            return False
        except PermissionError:
            return True

    def alive(self, timeout=5.0):
        """True if the office process runs and answers a simple call within timeout."""
        if self._proc is None or self._proc.poll() is not None:
            return False
        try:
            _with_timeout(self.desktop.getCurrentComponent, timeout, "alive")
            return True
        except Exception:
            return False

    def log_tail(self, chars=4000):
        try:
            with open(self.log_path, "rb") as f:
                return f.read()[-chars:].decode("utf-8", "replace")
        except OSError:
            return ""

    # -- documents -------------------------------------------------------

    def new_calc(self):
        """A new, hidden, empty spreadsheet document."""
        return self._call(lambda: self.desktop.loadComponentFromURL(
            "private:factory/scalc", "_blank", 0, _props(Hidden=True)), "new_calc")

    def open(self, path):
        """Open a file hidden; raises if the office cannot load it."""
        url = uno.systemPathToFileUrl(os.path.abspath(path))
        doc = self._call(lambda: self.desktop.loadComponentFromURL(
            url, "_blank", 0, _props(Hidden=True)), "open " + path, timeout=120.0)
        if doc is None:
            raise IOError("office could not open " + path)
        return doc

    def store(self, doc, path, filter_name):
        """Write doc to path with an export filter, e.g. "calc8" (.ods),
        "Calc MS Excel 2007 XML" (.xlsx). The document keeps its own location."""
        url = uno.systemPathToFileUrl(os.path.abspath(path))
        self._call(lambda: doc.storeToURL(url, _props(FilterName=filter_name, Overwrite=True)),
                   "store " + path, timeout=120.0)

    def export_pdf(self, doc, path):
        self.store(doc, path, "calc_pdf_Export")


def start_module_office(extension_path, prepare=None):
    """One office with the extension and a new spreadsheet for a whole test module (its
    setUpModule); `prepare(doc)` fills the document. Returns (office, doc); the office is stopped
    again if starting or preparing fails. The module's tearDownModule calls stop_module_office."""
    office = HeadlessOffice(extension_path=extension_path)
    office.__enter__()
    try:
        doc = office.new_calc()
        if prepare is not None:
            prepare(doc)
    except BaseException:
        office.__exit__(None, None, None)
        raise
    return office, doc


def stop_module_office(office):
    if office is not None:
        office.__exit__(None, None, None)


# -- sheet helpers -------------------------------------------------------------

def _origin(sheet, name):
    address = sheet.getCellRangeByName(name).getRangeAddress()
    return address.StartColumn, address.StartRow


def set_values(sheet, top_left, rows):
    """Write a rectangle of numbers/strings starting at top_left ("A1").

    None makes the cell empty. Strings are stored as text, never parsed as numbers or
    formulas. All rows must have the same length."""
    rows = [list(row) for row in rows]
    if not rows or not rows[0]:
        return
    width = len(rows[0])
    if any(len(row) != width for row in rows):
        raise ValueError("set_values needs rows of equal length")
    data = []
    for row in rows:
        out = []
        for value in row:
            if value is None:
                out.append("")  # setDataArray leaves a cell empty for ""
            elif isinstance(value, str):
                out.append(value)
            else:
                out.append(float(value))
        data.append(tuple(out))
    col, row = _origin(sheet, top_left)
    target = sheet.getCellRangeByPosition(col, row, col + width - 1, row + len(rows) - 1)
    target.setDataArray(tuple(data))


def set_formula(sheet, cell, formula):
    """One cell formula, English names, ';' between arguments: "=ROUND(A1;2)"."""
    sheet.getCellRangeByName(cell).getCellByPosition(0, 0).setFormula(formula)


def set_array_formula(sheet, cell_range, formula):
    """An array formula over cell_range ("G2:M17"), like Ctrl+Shift+Enter."""
    sheet.getCellRangeByName(cell_range).setArrayFormula(formula)


def _cell_value(cell):
    code = cell.getError()
    if code:
        return error_text(code)
    kind = cell.getType().value  # CellContentType: EMPTY, VALUE, TEXT, FORMULA
    if kind == "EMPTY":
        return None
    if kind == "VALUE":
        return cell.getValue()
    if kind == "TEXT":
        return cell.getString()
    if cell.FormulaResultType2 == _RESULT_STRING:
        return cell.getString()
    return cell.getValue()


def get_cell(sheet, cell):
    """A cell's value: float, str, None for an empty cell, or an error text such as
    "Err:504" or "#NAME?"."""
    return _cell_value(sheet.getCellRangeByName(cell).getCellByPosition(0, 0))


def get_range(sheet, cell_range):
    """Values of cell_range as a list of rows, each value as get_cell returns it."""
    rng = sheet.getCellRangeByName(cell_range)
    # getDataArray reads everything in one call but gives "" for empty cells and
    # hides errors: fix those up from two queries instead of asking cell by cell.
    rows = [list(row) for row in rng.getDataArray()]
    start_col, start_row = _origin(sheet, cell_range)

    def positions(ranges):
        for address in ranges.getRangeAddresses():
            for r in range(address.StartRow, address.EndRow + 1):
                for c in range(address.StartColumn, address.EndColumn + 1):
                    yield r - start_row, c - start_col

    for r, c in positions(rng.queryEmptyCells()):
        rows[r][c] = None
    for r, c in positions(rng.queryFormulaCells(_RESULT_ERROR)):
        rows[r][c] = _cell_value(rng.getCellByPosition(c, r))
    return rows


def recalc(doc):
    """Recalculate every formula in doc, not only the dirty ones."""
    doc.calculateAll()
