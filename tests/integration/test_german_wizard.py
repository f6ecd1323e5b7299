"""The Function Wizard in German (issue 18): with the office's user interface in German, Calc
passes the German UI locale to the add-in (XAddIn.setLocale) and the wizard shows Isoquant's German
function descriptions, argument names and argument descriptions; the function names stay PRODFIT,
PRODCOST, … In an office with the default (English) user interface the English texts remain.

Run from the repository root with Debian's Python (the only one that imports uno):
    /usr/bin/python3 -m unittest -v tests/integration/test_german_wizard.py

Needs Debian's libreoffice-l10n-de (.ci/packages.txt): without an installed German language pack
LibreOffice falls back to an English user interface whatever UILocale says.

Two offices serve the module, one after the other: a German one (the user interface language written
to the throw-away profile as Tools > Options > Language Settings > Languages > User interface does,
/org.openoffice.Office.Linguistic/General UILocale = "de-DE", then a restart, since the office
reads it when it starts) and an English one (a fresh profile, default settings). Each office's
com.sun.star.sheet.FunctionDescriptions are read into plain dictionaries and the office is stopped.

Sources of the expected texts, named beside each check:
- "German table": addin/function_texts_de.cxx, the German texts; "English table":
  addin/function_table.cxx. The argument names below are the wizard's vocabulary in both languages.
- "LibreOffice's German function names": the office's own names of built-in functions in a German
  user interface (SUMME for SUM), proof that the interface really is German (from memory).
"""

import unittest

import uno
from isoquant_office import HeadlessOffice

from .support import EXTENSION as OXT

ADD_IN = 11  # com.sun.star.sheet.FunctionCategory.ADDIN (the built-in PRODUCT also starts with PROD)

# The wizard's vocabulary: each German argument name and the English one it translates (German
# table, English table). One German name for one English name, as tests/unit/test_wizard_texts.cpp
# checks for the tables themselves.
ENGLISH_NAME = {
    "Ausbringung": "output", "Faktormengen": "inputs", "Funktionsform": "form",
    "konstante Skalenerträge": "constant returns", "Standardfehler": "errors", "Konfidenzniveau": "level",
    "Kontrollvariablen": "controls", "Gruppen": "groups", "Effekte": "effects", "Trend": "trend",
    "unvollständige Zeilen": "incomplete rows", "Zeilenbezeichnung": "row label",
    "Spaltenbezeichnung": "column label", "Modell": "model", "Mittelwert": "mean", "Faktor": "input",
    "Perioden": "periods", "Gewichte": "weights", "Methode": "method", "Mengen": "quantities",
    "Kostenanteile": "shares", "Basis": "base", "Faktor i": "input i", "Faktor j": "input j", "Art": "kind",
    "Zielausbringung": "target output", "Faktorpreise": "input prices", "Kennzahl": "what", "Kosten": "cost",
    "Tabelle": "table", "Ineffizienz": "inefficiency", "Ausbringungen": "outputs", "Skalenerträge": "returns",
    "Orientierung": "orientation", "Namen": "names",
    "Budget": "budget", "Produktpreis": "output price", "Ausbringungsniveau": "output level",
    "Mengen von Faktor i": "values of input i", "Kovarianz": "covariance", "Statistik": "statistic",
}
FIT_ARGUMENTS = ["Funktionsform", "konstante Skalenerträge", "Standardfehler", "Konfidenzniveau",
                 "Kontrollvariablen", "Gruppen", "Effekte", "Trend", "unvollständige Zeilen"]
AT_BUNDLES = ["Modell", "Faktormengen"]
# German argument names of every function on this branch (German table).
GERMAN_ARGUMENTS = {
    "PRODFIT": ["Ausbringung", "Faktormengen"] + FIT_ARGUMENTS + ["Kovarianz"],
    "PRODSTAT": ["Ausbringung", "Faktormengen", "Zeilenbezeichnung", "Spaltenbezeichnung"] + FIT_ARGUMENTS,
    "PRODVALUE": ["Tabelle", "Zeilenbezeichnung", "Spaltenbezeichnung"],
    "PRODEFFICIENTSCALE": ["Modell", "Faktorpreise", "Kennzahl"],
    "PRODPRICEELASTICITY": ["Modell", "Ausbringung", "Faktorpreise", "Faktor i", "Faktor j", "Art"],
    "PRODFRONTIER": ["Ausbringung", "Faktormengen", "Funktionsform", "Ineffizienz", "Konfidenzniveau",
                     "Kontrollvariablen", "Kovarianz"],
    "PRODEFFICIENCY": ["Modell", "Ausbringung", "Faktormengen", "Kennzahl"],
    "PRODENVELOPE": ["Ausbringungen", "Faktormengen", "Skalenerträge", "Orientierung", "Kennzahl", "Namen"],
    "PRODOUTPUT": AT_BUNDLES + ["Mittelwert", "Kennzahl"],
    "PRODMARGINAL": AT_BUNDLES + ["Faktor", "Kennzahl"],
    "PRODELASTICITY": AT_BUNDLES + ["Faktor", "Kennzahl"],
    "PRODSCALE": ["Modell", "Faktormengen", "Kennzahl"],
    "PRODRETURNS": ["Modell", "Konfidenzniveau"],
    "PRODTFP": ["Modell", "Ausbringung", "Faktormengen", "Perioden", "Kennzahl"],
    "PRODGROWTH": ["Ausbringung", "Faktormengen", "Gewichte", "Methode", "Perioden"],
    "PRODINDEX": ["Mengen", "Kostenanteile", "Methode", "Basis", "Perioden"],
    "PRODREGULAR": AT_BUNDLES,
    "PRODCOMPARE": ["Ausbringung", "Faktormengen", "Konfidenzniveau"],
    "PRODSECOND": AT_BUNDLES + ["Faktor i", "Faktor j", "Kennzahl"],
    "PRODINPUTRETURNS": AT_BUNDLES + ["Faktor"],
    "PRODPAIR": AT_BUNDLES + ["Faktor i", "Faktor j"],
    "PRODMRTS": AT_BUNDLES + ["Faktor i", "Faktor j", "Kennzahl"],
    "PRODSUBSTITUTION": AT_BUNDLES + ["Faktor i", "Faktor j", "Art", "Kennzahl"],
    "PRODLEASTCOST": ["Modell", "Zielausbringung", "Faktorpreise", "Kennzahl"],
    "PRODCOST": ["Modell", "Zielausbringung", "Faktorpreise", "Kennzahl", "Statistik"],
    "PRODCOSTFIT": ["Kosten", "Ausbringung", "Faktorpreise", "Funktionsform", "Kostenanteile", "Standardfehler",
                    "Konfidenzniveau", "Kontrollvariablen", "Gruppen", "Effekte", "Trend",
                    "unvollständige Zeilen", "Ineffizienz", "Kovarianz"],
    "PRODBUDGET": ["Modell", "Budget", "Faktorpreise", "Kennzahl"],
    "PRODPROFIT": ["Modell", "Produktpreis", "Faktorpreise"],
    "PRODISOQUANT": ["Modell", "Ausbringungsniveau", "Mengen von Faktor i", "Faktor i", "Faktor j"],
}
# A term each description must use: German (German table), English (English table).
TERMS = {
    "PRODFIT": ("Produktionsfunktion", "production function"),
    "PRODMARGINAL": ("Grenzprodukt", "Marginal product"),
    "PRODELASTICITY": ("Produktionselastizität", "Output elasticity"),
    "PRODSCALE": ("Skalenerträge", "Returns to scale"),
    "PRODRETURNS": ("Skalenerträge", "returns to scale"),
    "PRODTFP": ("Totale Faktorproduktivität", "Total factor productivity"),
    "PRODGROWTH": ("Wachstumszerlegung", "Growth accounting"),
    "PRODINDEX": ("Kostenanteilen", "cost shares"),
    "PRODREGULAR": ("geränderten Hesse-Matrix", "bordered Hessian"),
    "PRODMRTS": ("Grenzrate der technischen Substitution", "Marginal rate of technical substitution"),
    "PRODSUBSTITUTION": ("Substitutionselastizität", "Elasticity of substitution"),
    "PRODLEASTCOST": ("Faktorpreisen", "input prices"),
    "PRODCOST": ("Kostenfunktion", "cost function"),
    "PRODCOSTFIT": ("Kostenfunktion", "cost function"),
    "PRODPROFIT": ("Gewinnmaximierender", "Profit-maximising"),
    "PRODISOQUANT": ("Isoquante", "isoquant"),
}

GERMAN = None   # name -> {"description", "arguments": [(name, description)]} of the German office
ENGLISH = None  # the same for the English office
BUILT_IN = {}   # "german"/"english" -> set of the names of all functions each office lists


def set_ui_locale(office, tag):
    """Writes the user interface language as the Options dialog does ("" is the system default)."""
    provider = office.service_manager.createInstanceWithContext(
        "com.sun.star.configuration.ConfigurationProvider", office.context)
    path = uno.createUnoStruct("com.sun.star.beans.PropertyValue")
    path.Name, path.Value = "nodepath", "/org.openoffice.Office.Linguistic/General"
    access = provider.createInstanceWithArguments("com.sun.star.configuration.ConfigurationUpdateAccess", (path,))
    access.replaceByName("UILocale", tag)
    access.commitChanges()


def read_wizard(office):
    """(Isoquant's functions as the wizard shows them, the names of every function listed)."""
    descriptions = office.service_manager.createInstanceWithContext(
        "com.sun.star.sheet.FunctionDescriptions", office.context)
    functions, names = {}, set()
    for k in range(descriptions.getCount()):
        properties = {p.Name: p.Value for p in descriptions.getByIndex(k)}
        name = str(properties.get("Name", ""))
        names.add(name)
        if name.startswith("PROD") and properties["Category"] == ADD_IN:
            functions[name] = {"description": properties["Description"],
                               "arguments": [(a.Name, a.Description) for a in properties["Arguments"]]}
    return functions, names


def setUpModule():
    global GERMAN, ENGLISH
    office = HeadlessOffice(extension_path=OXT)
    office.__enter__()
    try:
        set_ui_locale(office, "de-DE")
        # The harness has no restart of its own: stop and start the office on the same profile
        # (as it does after installing the extension); the UI language is read at start.
        office._stop()
        office._start()
        GERMAN, BUILT_IN["german"] = read_wizard(office)
        if "SUMME" not in BUILT_IN["german"]:  # LibreOffice's German function names
            raise RuntimeError("the office's user interface did not switch to German: is Debian's "
                               "libreoffice-l10n-de installed (.ci/packages.txt)?")
    finally:
        office.__exit__(None, None, None)
    office = HeadlessOffice(extension_path=OXT)
    office.__enter__()
    try:
        ENGLISH, BUILT_IN["english"] = read_wizard(office)
    finally:
        office.__exit__(None, None, None)


class GermanWizardTest(unittest.TestCase):

    def test_the_office_speaks_german(self):
        # LibreOffice's German function names: the user interface really is German.
        self.assertIn("SUMME", BUILT_IN["german"])
        self.assertNotIn("SUMME", BUILT_IN["english"])
        self.assertIn("SUM", BUILT_IN["english"])

    def test_function_names_stay_the_same(self):
        self.assertEqual(sorted(GERMAN), sorted(ENGLISH))
        for name in GERMAN_ARGUMENTS:
            self.assertIn(name, GERMAN)

    def test_german_argument_names(self):
        for name, expected in GERMAN_ARGUMENTS.items():
            with self.subTest(function=name):
                self.assertEqual([n for n, _ in GERMAN[name]["arguments"]], expected)  # German table

    def test_english_argument_names_in_the_english_office(self):
        for name, german in GERMAN_ARGUMENTS.items():
            with self.subTest(function=name):
                self.assertEqual([n for n, _ in ENGLISH[name]["arguments"]],
                                 [ENGLISH_NAME[n] for n in german])  # English table

    def test_descriptions_use_the_terms_of_the_trade(self):
        for name, (german, english) in TERMS.items():
            with self.subTest(function=name):
                self.assertIn(german, GERMAN[name]["description"])  # German table
                self.assertIn(english, ENGLISH[name]["description"])  # English table
                self.assertNotIn(english, GERMAN[name]["description"])

    def test_every_text_is_translated(self):
        # Every function the office lists, also one added later: each description and argument in
        # German differs from its English text, and none is empty.
        for name in ENGLISH:
            with self.subTest(function=name):
                german, english = GERMAN[name], ENGLISH[name]
                self.assertTrue(german["description"])
                self.assertNotEqual(german["description"], english["description"])
                self.assertEqual(len(german["arguments"]), len(english["arguments"]))
                for (german_name, german_text), (english_name, english_text) in zip(
                        german["arguments"], english["arguments"]):
                    self.assertTrue(german_name and german_text)
                    self.assertNotEqual(german_name, english_name)
                    self.assertNotEqual(german_text, english_text)

    def test_german_details(self):
        # German table: TRUE and FALSE as a German office names them, #N/A as #NV, and the words
        # typed into cells kept in English.
        fit = dict(GERMAN["PRODFIT"]["arguments"])
        self.assertIn("WAHR", fit["konstante Skalenerträge"])
        self.assertIn("FALSCH", fit["konstante Skalenerträge"])
        self.assertIn("#NV", fit["unvollständige Zeilen"])
        self.assertIn('"cobb-douglas"', fit["Funktionsform"])
        self.assertIn('"hc1"', fit["Standardfehler"])
        self.assertIn("Matrixformel", GERMAN["PRODFIT"]["description"])


if __name__ == "__main__":
    unittest.main()
