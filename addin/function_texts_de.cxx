// German Function Wizard texts, one block per function, keyed by the programmatic name of
// function_table.cxx and with the arguments in its order. Display names stay English. Words the
// user types into a cell ("cobb-douglas", "hc1", "total", typed model labels) stay English and
// quoted, as the functions read them; TRUE and FALSE are WAHR and FALSCH in a German office.
#include "function_arguments_de.hxx"

namespace isoquant::addin {

// PRODFIT, PRODSTAT, PRODVALUE and the evaluators of a model.
std::vector<TranslatedFunction> germanFittingTexts()
{
    return {
    {"prodFit",
     "Schätzt eine Produktionsfunktion aus Ausbringung und Faktoreinsatz nach der Methode der kleinsten Quadrate "
     "in Logarithmen. Liefert eine Tabelle (als Matrixformel eingeben): Schätzwerte mit Standardfehlern, t- und "
     "p-Werten und Konfidenzgrenzen, Gütemaße, die Skalenerträge mit dem Test auf den Wert 1 und ein Urteil.",
     {germanOutputArgument, germanInputsArgument, formArgument, constantReturnsArgument, errorsArgument, levelArgument,
      controlsArgument, groupsArgument, effectsArgument, trendArgument, incompleteRowsArgument,
      {"Kovarianz", "WAHR, um unter der Tabelle die geschätzte Kovarianzmatrix der Parameter anzufügen (der unter "
                    "Standardfehler gewählten Art), eine Zeile je Parameter, für Grenzen abgeleiteter Größen; die "
                    "Tabelle ist dann max(7, q + 1) Spalten breit und 1 + q Zeilen länger, q = p Parameter "
                    "(cobb-douglas 1 + k + m, translog 1 + k + k(k+1)/2 + m, ces 4), dazu 1 für die Zeile des "
                    "von den Auswertungsfunktionen benutzten ln A, wenn Kontrollvariablen, Effekte oder ein Trend "
                    "es verschieben, und 1 für den technischen Fortschritt je Periode eines Trends. FALSCH oder "
                    "leer: kein Block."}}},
    {"prodStat",
     "Ein Wert der PRODFIT-Tabelle, gesucht nach Zeilen- und Spaltenbezeichnung, ohne Matrixformel.",
     {germanOutputArgument, germanInputsArgument,
      {"Zeilenbezeichnung", "Eine Zeile der Tabelle, mit ihrer englischen Bezeichnung: ln A, die Bezeichnung "
                            "eines Faktors, R2, adjusted R2, residual SD, F, log-likelihood, AIC, BIC, returns to "
                            "scale, verdict, observations, smearing factor…; mit Effekten auch \"effect of group "
                            "<Bezeichnung>\" (und \"effect of period <Jahr>\")."},
      {"Spaltenbezeichnung", "value (Standard), std. error, t, p-value, lower bound oder upper bound."},
      formArgument, constantReturnsArgument, errorsArgument, levelArgument, controlsArgument, groupsArgument,
      effectsArgument, trendArgument, incompleteRowsArgument}},
    {"prodValue",
     "Ein Wert einer Tabelle, die schon auf dem Blatt steht (PRODFIT, PRODCOSTFIT, …), gesucht nach Zeilen- "
     "und Spaltenbezeichnung: der schnelle Weg, Zahlen einer Schätzung in vielen Zellen zu zeigen.",
     {{"Tabelle", "Die ganze Tabelle, wie die Schätzfunktion sie ausgab, mit ihrer Kopfzeile, z. B. $I$1:$O$17."},
      {"Zeilenbezeichnung", "Eine Zeile der Tabelle, mit ihrer englischen Bezeichnung: ln A, die Bezeichnung "
                            "eines Faktors, R2, residual SD, F, AIC, returns to scale, verdict, observations, "
                            "smearing factor…"},
      {"Spaltenbezeichnung", "Ein Wort der Kopfzeile der Tabelle: value (Standard), std. error, t, p-value, "
                             "lower bound oder upper bound."}}},
    {"prodOutput", "Ausbringung, die das Modell für jede Zeile von Faktormengen vorhersagt.",
     {modelArgument, bundlesArgument,
      {"Mittelwert", "WAHR für die Vorhersage des Mittelwerts (der Median, multipliziert mit dem "
                     "Smearing-Faktor der Tabelle); FALSCH oder leer für die Vorhersage des Medians, exp des "
                     "geschätzten Logarithmus."},
      {"Kennzahl", "Wie bei PRODMARGINAL (\"value\", \"std. error\", \"lower bound\", \"upper bound\"), dazu "
                   "\"prediction lower\" oder \"prediction upper\": das Intervall für die Ausbringung eines "
                   "neuen Betriebs, mit der Residualvarianz."}}},
    {"prodMarginal",
     "Grenzprodukt eines Faktors für jede Zeile von Faktormengen: die zusätzliche Ausbringung aus einer weiteren "
     "Einheit dieses Faktors.",
     {modelArgument, bundlesArgument, inputArgument, boundsArgument}},
    {"prodElasticity",
     "Produktionselastizität eines Faktors für jede Zeile von Faktormengen: die prozentuale Änderung der "
     "Ausbringung bei 1 % mehr von diesem Faktor.",
     {modelArgument, bundlesArgument, inputArgument, boundsArgument}},
    {"prodScale",
     "Skalenelastizität, das Maß der Skalenerträge: die prozentuale Änderung der Ausbringung, wenn alle Faktoren "
     "um 1 % steigen (die Summe der Produktionselastizitäten).",
     {modelArgument,
      {"Faktormengen", "Optionale Zeilen von Faktormengen: das Ergebnis ist dann eine Spalte mit einem Wert je "
                       "Zeile."},
      boundsArgument}},
    {"prodReturns",
     "Urteil über die Skalenerträge: steigend, konstant oder sinkend (die Zelle zeigt increasing, constant oder "
     "decreasing), nach dem Test, ob die Skalenelastizität gleich 1 ist, auf dem gegebenen Konfidenzniveau. Ein "
     "eingegebenes Modell ohne Standardfehler wird allein nach seiner Skalenelastizität beurteilt; eine "
     "ces-Tabelle ohne Test (Randlösung, nicht konvergiert, nicht identifiziert) liefert ihr eigenes \"not "
     "tested (...)\".",
     {modelArgument, {"Konfidenzniveau", "Konfidenzniveau des Tests, zwischen 0 und 1 (Standard 0,95)."}}},
    };
}

// Productivity and growth.
std::vector<TranslatedFunction> germanGrowthTexts()
{
    return {
    {"prodTfp",
     "Totale Faktorproduktivität jeder Zeile: beobachtete Ausbringung geteilt durch die Ausbringung, die das "
     "Modell aus den Faktormengen dieser Zeile vorhersagt (1 = genau wie vorhergesagt). Eine Spalte, ein Wert je "
     "Zeile. Auf den Zeilen, an die eine PRODFIT-Tabelle angepasst wurde, ist das geometrische Mittel 1 (bei "
     "einem Trend, wenn Perioden angegeben sind).",
     {modelArgument, germanOutputArgument,
      {"Faktormengen", "Faktormengen jeder Zeile in der Faktorreihenfolge des Modells, so viele Zeilen wie bei der "
                       "Ausbringung. Eine erste Zeile mit Text benennt die Faktoren."},
      {"Perioden", "Optional, für ein Modell mit Trend: die Periode (das Jahr) jeder Zeile, so viele Zeilen wie "
                   "bei der Ausbringung. Jede Zeile wird dann mit der Technologie ihrer eigenen Periode "
                   "verglichen: ln A + technischer Fortschritt je Periode × (Periode - letzte Periode)."},
      boundsArgument}},
    {"prodGrowth",
     "Wachstumszerlegung von einer Periode zur nächsten: das Wachstum der Ausbringung, aufgeteilt in den Beitrag "
     "jedes Faktors, einen Skaleneffekt und das TFP-Wachstum (den Rest), in Log-Differenzen, dazu eine "
     "Summenzeile. Liefert eine Tabelle (als Matrixformel eingeben). Das TFP-Wachstum enthält den Skaleneffekt "
     "nicht: das Solow-Residuum (Wachstum der Ausbringung minus die Beiträge) = Skaleneffekt + TFP-Wachstum.",
     {{"Ausbringung", "Ausbringungsmenge jeder Periode in zeitlicher Reihenfolge: eine Spalte positiver Zahlen. "
                      "Eine erste Zeile mit Text gilt als Überschrift."},
      {"Faktormengen", "Faktoreinsatzmengen jeder Periode, eine Spalte je Faktor, positiv, so viele Perioden wie "
                       "bei der Ausbringung. Eine erste Zeile mit Text benennt die Faktoren."},
      {"Gewichte", "Ein Modell (eine PRODFIT-Tabelle oder ein eingegebenes Modell: seine "
                   "Produktionselastizitäten bei den Faktormengen jeder Periode) oder Kostenanteile der Faktoren, "
                   "eine Spalte je Faktor und eine Zeile je Periode, jede Zeile mit der Summe 1 auf 0,01 genau "
                   "(auf genau 1 umskaliert; Anteile, nicht Prozent). Eine Überschrift wie \"labour share\" "
                   "benennt den Faktor."},
      {"Methode", "\"tornqvist\" (Standard: Gewichte über benachbarte Perioden gemittelt) oder \"fixed\" (die "
                  "konstanten Elastizitäten eines cobb-douglas-Modells)."},
      periodNamesArgument}},
    {"prodIndex",
     "Verketteter Mengenindex mehrerer Faktoren, gewichtet mit ihren Kostenanteilen: ein Wert je Periode, die "
     "erste Periode = 1, sofern keine Basis angegeben ist.",
     {{"Mengen", "Mengen jeder Periode, eine Spalte je Faktor, positiv. Eine erste Zeile mit Text benennt sie."},
      {"Kostenanteile", "Kostenanteile der Faktoren in jeder Periode, in derselben Form wie die Mengen, jede Zeile "
                        "mit der Summe 1 auf 0,01 genau (auf genau 1 umskaliert; Anteile, nicht Prozent). Eine "
                        "Überschrift wie \"labour share\" benennt den Faktor."},
      {"Methode", "\"tornqvist\" (Standard), \"laspeyres\", \"paasche\" oder \"fisher\"."},
      {"Basis", "Wert des Index in der ersten Periode, eine positive Zahl (Standard 1; 100 für Prozent)."},
      periodNamesArgument}},
    };
}

// The shape of a technology.
std::vector<TranslatedFunction> germanShapeTexts()
{
    return {
    {"prodRegular",
     "Ob das Modell bei jeder Zeile von Faktormengen regulär ist: \"regular\", wenn jedes Grenzprodukt positiv "
     "ist und die Isoquanten konvex sind (Test mit der geränderten Hesse-Matrix), sonst welche Bedingung verletzt "
     "ist.",
     {modelArgument, bundlesArgument}},
    {"prodCompare",
     "Schätzt die Formen cobb-douglas, ces und translog auf denselben Zeilen und liefert eine Tabelle (als "
     "Matrixformel eingeben, 8 Zeilen mal 7 Spalten): Log-Likelihood, AIC und BIC mit Rängen, den F-Test von "
     "cobb-douglas innerhalb von translog und den Likelihood-Quotienten-Test von cobb-douglas innerhalb von ces "
     "(rho = 0). AIC = -2LL + 2p und BIC = -2LL + p ln n, p aus der Spalte der Parameterzahl (sigma² nicht "
     "mitgezählt).",
     {germanOutputArgument, germanInputsArgument,
      {"Konfidenzniveau", "Niveau der Urteile über die verschachtelten Tests, zwischen 0 und 1 (Standard "
                          "0,95)."}}},
    {"prodSecond",
     "Zweite partielle Ableitung der Produktionsfunktion für jede Zeile von Faktormengen: wie sich das "
     "Grenzprodukt von Faktor i mit einer weiteren Einheit von Faktor j ändert (von Faktor i selbst, wenn j "
     "fehlt).",
     {modelArgument, bundlesArgument, firstInputArgument,
      {"Faktor j", "Optionaler zweiter Faktor: seine Nummer oder seine Bezeichnung. Weggelassen: derselbe wie "
                   "Faktor i."},
      boundsArgument}},
    {"prodInputReturns",
     "Ertragsverlauf eines einzelnen Faktors für jede Zeile von Faktormengen: abnehmend, konstant oder zunehmend "
     "(die Zelle zeigt diminishing, constant oder increasing), je nachdem, ob sein Grenzprodukt fällt, gleich "
     "bleibt oder steigt, wenn mehr davon eingesetzt wird und die übrigen Faktoren gleich bleiben. Meldet, wo das "
     "Grenzprodukt nicht positiv ist.",
     {modelArgument, bundlesArgument, inputArgument}},
    {"prodPair",
     "Technische Beziehung zweier Faktoren für jede Zeile von Faktormengen: Komplemente (complements), wenn mehr "
     "vom einen das Grenzprodukt des anderen erhöht, Substitute (substitutes), wenn es dieses senkt, unabhängig "
     "(independent), wenn es dieses nicht ändert. Nicht der Begriff nach Allen: die beiden Faktoren einer "
     "Cobb-Douglas-Funktion sind technische Komplemente, aber Allen-Substitute (Elastizität 1).",
     {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument}},
    {"prodMrts",
     "Grenzrate der technischen Substitution für jede Zeile von Faktormengen: die Einheiten von Faktor j, die "
     "eine weitere Einheit von Faktor i bei unveränderter Ausbringung ersetzt (Grenzprodukt von i geteilt durch "
     "das von j).",
     {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument, boundsArgument}},
    {"prodSubstitution",
     "Substitutionselastizität zwischen den Faktoren i und j für jede Zeile von Faktormengen: die prozentuale "
     "Änderung des Einsatzverhältnisses der beiden Faktoren je 1 % Änderung ihres Preisverhältnisses entlang der "
     "Isoquante.",
     {modelArgument, bundlesArgument, firstInputArgument, secondInputArgument,
      {"Art", "\"direct\" (Standard), \"allen\" oder \"morishima\" (nicht symmetrisch: i und j in der "
              "angegebenen Reihenfolge)."},
      {"Kennzahl", "\"value\" (Standard), \"std. error\", \"lower bound\" oder \"upper bound\", wie bei PRODMRTS. "
                   "Die Form cobb-douglas legt jede Substitutionselastizität auf 1 fest: Standardfehler 0, beide "
                   "Grenzen 1; translog und ces: Wert -/+ t mal Standardfehler."}}},
    };
}

const Translation& germanTranslation()
{
    static const Translation translation = [] {
        Translation german{"Produktionsökonomik", {}};
        for (auto family : {germanFittingTexts, germanGrowthTexts, germanShapeTexts, germanDecisionTexts,
                            germanCostTexts, germanCostFitTexts, germanEfficiencyTexts})
            for (TranslatedFunction& function : family()) german.functions.push_back(std::move(function));
        return german;
    }();
    return translation;
}

} // namespace isoquant::addin
