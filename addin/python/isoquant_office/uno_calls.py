"""UNO-side helpers of HeadlessOffice: property tuples, calls with a timeout, and the command
environment that answers the extension manager's questions."""

import threading

import uno
import unohelper
from com.sun.star.beans import PropertyValue
from com.sun.star.task import XInteractionHandler
from com.sun.star.ucb import XCommandEnvironment, XProgressHandler


def properties(**values):
    """A tuple of PropertyValue, e.g. properties(Hidden=True) for loadComponentFromURL."""
    result = []
    for name, value in values.items():
        prop = PropertyValue()
        prop.Name = name
        prop.Value = value
        result.append(prop)
    return tuple(result)


def with_timeout(func, seconds, what):
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


class ApprovingCommandEnvironment(unohelper.Base, XCommandEnvironment):
    def __init__(self):
        self.interaction_handler = _ApprovingInteractionHandler()
        self.progress_handler = _ProgressHandler()

    def getInteractionHandler(self):
        return self.interaction_handler

    def getProgressHandler(self):
        return self.progress_handler
