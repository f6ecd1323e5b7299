"""HeadlessOffice: a private headless LibreOffice on a throw-away profile, optionally with an
extension installed, whose every UNO call made here has a timeout."""

import atexit
import os
import shutil
import signal
import socket
import subprocess
import tempfile
import time

import uno
from com.sun.star.connection import NoConnectException
from com.sun.star.uno import RuntimeException as UnoRuntimeException

from .uno_calls import ApprovingCommandEnvironment, properties, with_timeout

SOFFICE_CANDIDATES = ("/usr/bin/soffice", "/usr/lib/libreoffice/program/soffice")


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
                self.context = with_timeout(lambda: resolver.resolve(url), left, "connect")
                break
            except (NoConnectException, UnoRuntimeException):
                # An office still starting may accept the socket before its initial object is
                # ready: the bridge then answers with a wrong object ("initial object
                # queryInterface ... returned ANY of type boolean", seen once in CI). Both mean
                # "not yet"; the deadline still bounds the wait.
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
        env = ApprovingCommandEnvironment()
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
                with_timeout(self._close_and_terminate, self.STOP_TIMEOUT, "terminate")
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
        return with_timeout(func, timeout or self.CALL_TIMEOUT, what)

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
            with_timeout(self.desktop.getCurrentComponent, timeout, "alive")
            return True
        except Exception:
            return False

    def log_tail(self, chars=4000):
        try:
            with open(self.log_path, "rb") as f:
                return f.read()[-chars:].decode("utf-8", "replace")
        except OSError:
            return ""

    def function_descriptions(self):
        """Every function the Function Wizard lists, each as {property: value} of
        com.sun.star.sheet.FunctionDescriptions (Name, Description, Category, Arguments, ...)."""
        def read():
            descriptions = self.service_manager.createInstanceWithContext(
                "com.sun.star.sheet.FunctionDescriptions", self.context)
            return [{p.Name: p.Value for p in descriptions.getByIndex(i)} for i in range(descriptions.getCount())]
        return self._call(read, "function descriptions")

    # -- documents -------------------------------------------------------

    def new_calc(self):
        """A new, hidden, empty spreadsheet document."""
        return self._call(lambda: self.desktop.loadComponentFromURL(
            "private:factory/scalc", "_blank", 0, properties(Hidden=True)), "new_calc")

    def open(self, path):
        """Open a file hidden; raises if the office cannot load it."""
        url = uno.systemPathToFileUrl(os.path.abspath(path))
        doc = self._call(lambda: self.desktop.loadComponentFromURL(
            url, "_blank", 0, properties(Hidden=True)), "open " + path, timeout=120.0)
        if doc is None:
            raise IOError("office could not open " + path)
        return doc

    def store(self, doc, path, filter_name):
        """Write doc to path with an export filter, e.g. "calc8" (.ods),
        "Calc MS Excel 2007 XML" (.xlsx). The document keeps its own location."""
        url = uno.systemPathToFileUrl(os.path.abspath(path))
        self._call(lambda: doc.storeToURL(url, properties(FilterName=filter_name, Overwrite=True)),
                   "store " + path, timeout=120.0)

    def export_pdf(self, doc, path):
        self.store(doc, path, "calc_pdf_Export")
