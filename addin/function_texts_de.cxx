// German Function Wizard texts, one block per function, keyed by the programmatic name of
// function_table.cxx and with the arguments in its order. Display names stay English. Words the
// user types into a cell ("cobb-douglas", "hc1", "total", typed model labels) stay English and
// quoted, as the functions read them; TRUE and FALSE are WAHR and FALSCH in a German office.
#include "wizard_texts.hxx"

namespace isoquant::addin {

namespace {

// Arguments shared by PRODFIT and PRODSTAT.
constexpr ArgumentInfo germanOutputArgument{
    "Ausbringung", "Ausbringungsmenge jeder Zeile (Betrieb, Filiale oder Periode): eine Spalte positiver Zahlen. "
                   "Eine erste Zeile mit Text gilt als Überschrift."};
constexpr ArgumentInfo germanInputsArgument{
    "Faktormengen", "Faktoreinsatzmengen jeder Zeile, eine Spalte je Produktionsfaktor (Arbeit, Kapital, …), positive "
                    "Zahlen, so viele Zeilen wie bei der Ausbringung. Eine erste Zeile mit Text benennt die Faktoren."};
constexpr ArgumentInfo formArgument{
    "Funktionsform", "Funktionsform: \"cobb-douglas\" (Standard), \"ces\" (genau zwei Faktoren, nichtlineare Methode "
                     "der kleinsten Quadrate) oder \"translog\"."};
constexpr ArgumentInfo constantReturnsArgument{
    "konstante Skalenerträge", "WAHR, um konstante Skalenerträge vorzugeben (Exponenten mit Summe 1); FALSCH oder "
                               "leer, um sie frei zu schätzen."};
constexpr ArgumentInfo errorsArgument{
    "Standardfehler", "Standardfehler: \"classical\" (Standard), \"hc1\" oder \"hc3\" (robust gegen "
                      "Heteroskedastizität) oder \"cluster\" (robust innerhalb jeder Gruppe des Arguments Gruppen; "
                      "Tests rechnen dann bei G Gruppen mit G - 1 Freiheitsgraden)."};
constexpr ArgumentInfo levelArgument{
    "Konfidenzniveau", "Konfidenzniveau der Konfidenzintervalle und des Urteils über die Skalenerträge, zwischen 0 "
                       "und 1 (Standard 0,95)."};
constexpr ArgumentInfo controlsArgument{
    "Kontrollvariablen", "Optionale zusätzliche Spalten, unlogarithmiert aufgenommen (eine Quote, eine "
                         "0/1-Dummyvariable), so viele Zeilen wie bei der Ausbringung."};
constexpr ArgumentInfo groupsArgument{
    "Gruppen", "Optionale Spalte, die den Betrieb oder das Unternehmen jeder Zeile nennt (Zahlen oder Texte), so viele "
               "Zeilen wie bei der Ausbringung, eine Überschriftszeile erlaubt. Nötig für Effekte und für "
               "\"cluster\"-Standardfehler."};
constexpr ArgumentInfo effectsArgument{
    "Effekte", "\"none\" (Standard: Gruppen bilden nur die Cluster), \"fixed\" (ein Effekt je Gruppe, "
               "Within-Schätzer) oder \"two-way\" (Gruppen- und Periodeneffekte; die Perioden kommen aus Trend)."};
constexpr ArgumentInfo trendArgument{
    "Trend", "Optionale Spalte der Perioden (Jahre), so viele Zeilen wie bei der Ausbringung: fügt einen Zeittrend "
             "hinzu, ausgewiesen als Rate des technischen Fortschritts je Periode (bei Datumswerten je Tag: für Jahre "
             "=JAHR(Datum) verwenden). Bei \"two-way\"-Effekten liefert die Spalte stattdessen die Perioden."};
constexpr ArgumentInfo incompleteRowsArgument{
    "unvollständige Zeilen", "WAHR, um Zeilen mit einer leeren oder einer Textzelle auszulassen (die Tabelle zählt "
                             "sie); FALSCH oder leer: eine solche Zelle ist ein Fehler. Leere Zeilen unter den Daten "
                             "beenden diese in jedem Fall (ganze Spalten funktionieren). Eine Zelle mit einem "
                             "Fehlerwert (#NV) lässt Calc schon vor dem Aufruf abbrechen (Err:504)."};
// The optional last argument of PRODGROWTH and PRODINDEX.
constexpr ArgumentInfo periodNamesArgument{
    "Perioden", "Optional: Jahr oder Name jeder Periode (Zahlen oder Texte), so viele Zeilen wie Perioden, eine "
                "Überschriftszeile erlaubt. Sie beschriften die Zeilen der Tabelle und die Meldungen anstelle von 2, "
                "3, …."};
constexpr ArgumentInfo modelArgument{
    "Modell", "Eine PRODFIT-Tabelle oder eine von Hand eingegebene Tabelle, Bezeichnungen in der ersten Spalte, Werte "
              "in der zweiten. Zeile 1: form | cobb-douglas (oder ces, translog). Zeile 2: A | Wert (oder ln A | "
              "Wert). Cobb-douglas: dann eine Zeile je Faktor, seine Bezeichnung | sein Exponent. Ces: dann Zeilen "
              "delta, sigma (oder rho) und nu, optional eine Zeile inputs | Bezeichnung 1 | Bezeichnung 2. Translog: "
              "dann eine Zeile je Faktor (Bezeichnung | Koeffizient erster Ordnung) und eine je Paar i <= j "
              "(Bezeichnung*Bezeichnung | Koeffizient, 0 ohne Wechselwirkung). Eine optionale Zeile smearing factor "
              "dient dem Mittelwert von PRODOUTPUT."};
constexpr ArgumentInfo bundlesArgument{
    "Faktormengen", "Eine Zeile von Faktormengen in der Faktorreihenfolge des Modells oder mehrere Zeilen: das "
                    "Ergebnis ist dann eine Spalte mit einem Wert je Zeile."};
constexpr ArgumentInfo inputArgument{"Faktor",
                                     "Welcher Faktor: seine Nummer (1 für den ersten) oder seine Bezeichnung."};
constexpr ArgumentInfo boundsArgument{
    "Kennzahl", "\"value\" (Standard: der Wert), \"std. error\" (Standardfehler), \"lower bound\" oder \"upper "
                "bound\" (untere oder obere Grenze): nach der Delta-Methode aus dem Kovarianzblock einer mit Kovarianz "
                "WAHR geschätzten PRODFIT-Tabelle, auf deren Niveau und mit deren t-Verteilung; Ausbringung, "
                "Grenzprodukte, kostenminimale und budgetoptimale Mengen, TFP und Grenzraten der Substitution "
                "erhalten Grenzen auf der Log-Skala. Form cobb-douglas."};

// Arguments shared by the decision functions.
constexpr ArgumentInfo firstInputArgument{"Faktor i", "Der erste Faktor: seine Nummer (1 für den ersten) oder seine "
                                                      "Bezeichnung."};
constexpr ArgumentInfo secondInputArgument{"Faktor j", "Der zweite Faktor: seine Nummer oder seine Bezeichnung."};
constexpr ArgumentInfo targetArgument{"Zielausbringung", "Die zu produzierende Ausbringungsmenge, eine positive Zahl."};
constexpr ArgumentInfo pricesArgument{
    "Faktorpreise", "Ein positiver Preis je Faktor in der Faktorreihenfolge des Modells: eine Zeile von Preisen "
                    "ergibt eine Zeile von Ergebnissen, eine Spalte eine Spalte."};
// PRODCOSTFIT's arguments that cost fits do not use yet.
constexpr std::string_view notForCostFits = "Für Kostenschätzungen noch nicht verfügbar; leer lassen.";

} // namespace

const Translation& germanTranslation()
{
    static const Translation translation{"Produktionsökonomik", {
        {"prodFit",
         "Schätzt eine Produktionsfunktion aus Ausbringung und Faktoreinsatz nach der Methode der kleinsten Quadrate "
         "in Logarithmen. Liefert eine Tabelle (als Matrixformel eingeben): Schätzwerte mit Standardfehlern, t- und "
         "p-Werten und Konfidenzgrenzen, Gütemaße, die Skalenerträge mit dem Test auf den Wert 1 und ein Urteil.",
         {germanOutputArgument, germanInputsArgument, formArgument, constantReturnsArgument, errorsArgument, levelArgument,
          controlsArgument, groupsArgument, effectsArgument, trendArgument, incompleteRowsArgument,
          {"Kovarianz", "WAHR, um unter der Tabelle die geschätzte Kovarianzmatrix der Parameter anzufügen (der unter "
                        "Standardfehler gewählten Art), eine Zeile je Parameter, für Grenzen abgeleiteter Größen; die "
                        "Tabelle ist dann max(7, p + 1) Spalten breit und 1 + p Zeilen länger, p Parameter. Nur für "
                        "die Form cobb-douglas. FALSCH oder leer: kein Block."}}},
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
                       "Grenzen 1."}}},
        {"prodLeastCost",
         "Kostenminimale Faktormengen, mit denen die Zielausbringung zu den gegebenen Faktorpreisen produziert wird: "
         "eine Menge je Faktor, als Zeile oder Spalte wie die Preise (als Matrixformel eingeben).",
         {modelArgument, targetArgument, pricesArgument, boundsArgument}},
        {"prodCost",
         "Kosten der kostenminimalen Produktion der Zielausbringung zu den gegebenen Faktorpreisen: Gesamtkosten, "
         "Grenzkosten (einer weiteren Einheit der Ausbringung), Durchschnittskosten, Kostenelastizität oder "
         "Skalenerträge. Das Modell kann auch eine Kostenfunktion sein: eine PRODCOSTFIT-Tabelle oder eingegebene "
         "Zeilen form | cobb-douglas cost, constant | Wert, output | Wert, dann eine Zeile je Faktor, seine "
         "Bezeichnung | sein Preiskoeffizient. Eine Spalte von Ausbringungsmengen ergibt eine Spalte von Werten.",
         {modelArgument,
          {"Zielausbringung", "Die zu produzierende Ausbringungsmenge, eine positive Zahl, oder eine Spalte von "
                              "Ausbringungsmengen (das Ergebnis ist dann eine Spalte)."},
          {"Faktorpreise", "Ein positiver Preis je Faktor in der Reihenfolge des Modells, als Zeile oder Spalte; bei "
                           "einer Spalte von Ausbringungsmengen eine Zeile Preise je Ausbringungsmenge (oder eine "
                           "Zeile für alle)."},
          {"Kennzahl", "\"total\" (Standard: Gesamtkosten), \"marginal\" (Grenzkosten), \"average\" "
                       "(Durchschnittskosten), \"cost elasticity\" (prozentuale Änderung der Kosten je Prozent "
                       "Ausbringung) oder \"returns to scale\" (deren Kehrwert)."}}},
        {"prodCostFit",
         "Schätzt eine Kostenfunktion aus beobachteten Kosten, Ausbringung und Faktorpreisen nach der Methode der "
         "kleinsten Quadrate in Logarithmen, linear homogen in den Preisen. Liefert eine Tabelle (als Matrixformel "
         "eingeben): Schätzwerte mit Standardfehlern, Gütemaße, Kostenelastizität, Skalenerträge mit Test und Urteil, "
         "effiziente Betriebsgröße.",
         {{"Kosten", "Gesamtkosten jeder Zeile (Betrieb, Filiale oder Periode): eine Spalte positiver Zahlen. Eine "
                     "erste Zeile mit Text gilt als Überschrift."},
          {"Ausbringung", "Ausbringungsmenge jeder Zeile: eine Spalte positiver Zahlen, so viele Zeilen wie bei den "
                          "Kosten."},
          {"Faktorpreise", "Die Preise, die jede Zeile für ihre Faktoren gezahlt hat, eine Spalte je Faktor, positive "
                           "Zahlen, so viele Zeilen wie bei den Kosten. Eine erste Zeile mit Text benennt die "
                           "Faktoren; die Homogenität wird durch Division durch den letzten Preis erzwungen."},
          {"Funktionsform", "\"cobb-douglas\" (Standard) oder \"translog\"."},
          {"Kostenanteile", "Kostenanteile der Faktoren (für Kostenschätzungen noch nicht verfügbar; leer lassen)."},
          {"Standardfehler", "Standardfehler: \"classical\" (Standard), \"hc1\" oder \"hc3\" (robust gegen "
                             "Heteroskedastizität)."},
          levelArgument,
          {"Kontrollvariablen", notForCostFits},
          {"Gruppen", notForCostFits},
          {"Effekte", notForCostFits},
          {"Trend", notForCostFits},
          {"unvollständige Zeilen", notForCostFits}}},
        {"prodBudget",
         "Beste Aufteilung eines festen Budgets auf die Faktoren: die Menge jedes Faktors, die bei genau diesen "
         "Ausgaben die größte Ausbringung ergibt, dann diese Ausbringung; als Zeile oder Spalte wie die Preise (als "
         "Matrixformel eingeben).",
         {modelArgument, {"Budget", "Das Geld, das für die Faktoren ausgegeben wird, eine positive Zahl."},
          pricesArgument, boundsArgument}},
        {"prodProfit",
         "Gewinnmaximierender Plan zu den gegebenen Produkt- und Faktorpreisen: die Menge jedes Faktors, dann "
         "Ausbringung und Gewinn, als Zeile oder Spalte wie die Faktorpreise (als Matrixformel eingeben). Bei "
         "konstanten oder steigenden Skalenerträgen gibt es kein endliches Maximum, und die Zelle meldet das.",
         {modelArgument,
          {"Produktpreis", "Der Preis, zu dem eine Einheit der Ausbringung verkauft wird, eine positive Zahl."},
          pricesArgument}},
        {"prodIsoquant",
         "Punkte einer Isoquante: für jeden Wert von Faktor i die Menge von Faktor j, die die Ausbringung auf dem "
         "gegebenen Niveau hält, als Spalte (für ein XY-Diagramm). Eine Zeile ohne eine solche Menge meldet das.",
         {modelArgument,
          {"Ausbringungsniveau", "Die Ausbringung, die die Isoquante hält, eine positive Zahl."},
          {"Mengen von Faktor i", "Eine Spalte von Mengen des Faktors i; bei einem Modell mit mehr als zwei Faktoren "
                                  "eine Spalte je Faktor, die übrigen auf den Werten der jeweiligen Zeile gehalten "
                                  "(die Spalte von Faktor j wird nicht gelesen)."},
          {"Faktor i", "Optional: der Faktor, dessen Mengen gegeben sind, seine Nummer oder seine Bezeichnung "
                       "(Standard: der erste)."},
          {"Faktor j", "Optional: der Faktor, nach dem aufgelöst wird, seine Nummer oder seine Bezeichnung "
                       "(Standard: der erste andere Faktor)."}}},
        {"prodEfficientScale",
         "Ausbringung, bei der die Durchschnittskosten zu den gegebenen Faktorpreisen am niedrigsten sind (die "
         "effiziente Betriebsgröße), aus einem Kostenmodell (PRODCOSTFIT-Tabelle oder eingetippte Zeilen, wie bei "
         "PRODCOST) oder einem Produktionsmodell, dessen Skalenerträge mit der Größe fallen. Meldet, wenn die "
         "Durchschnittskosten im Modell bei jeder Ausbringung fallen oder steigen.",
         {modelArgument,
          {"Faktorpreise", "Ein positiver Preis je Faktor, in der Reihenfolge des Modells, als Zeile oder Spalte."}}},
        {"prodPriceElasticity",
         "Preiselastizität zwischen den Faktoren i und j im kostenminimalen Plan für die Ausbringung: \"demand\" "
         "(Nachfrageelastizität: prozentuale Änderung der kostenminimalen Menge von i je Prozent Preisänderung "
         "von j, bei gleicher Ausbringung), \"allen\" oder \"morishima\". Aus einem Kostenmodell (wie bei "
         "PRODCOST) oder, über die Dualität, aus einem Produktionsmodell.",
         {modelArgument,
          {"Ausbringung", "Die Ausbringung, eine positive Zahl, oder eine Spalte von Ausbringungen (das Ergebnis "
                          "ist dann eine Spalte)."},
          {"Faktorpreise", "Ein positiver Preis je Faktor, in der Reihenfolge des Modells, als Zeile oder Spalte; "
                           "bei einer Spalte von Ausbringungen eine Zeile Preise je Ausbringung (oder eine für "
                           "alle)."},
          {"Faktor i", "Der Faktor, dessen Menge reagiert: seine Nummer (1 für den ersten) oder seine "
                       "Bezeichnung."},
          {"Faktor j", "Der Faktor, dessen Preis sich ändert: seine Nummer oder seine Bezeichnung."},
          {"Art", "\"demand\" (Standard), \"allen\" oder \"morishima\" (nicht symmetrisch: i und j in der "
                  "gegebenen Reihenfolge, wie bei PRODSUBSTITUTION)."}}},
        {"prodFrontier",
         "Schätzt eine stochastische Produktionsgrenze nach der Maximum-Likelihood-Methode: ln Ausbringung = "
         "Grenze + Störterm - Ineffizienz. Gibt eine Tabelle zurück (als Matrixformel eingeben): die Schätzwerte "
         "der Grenze, Standardabweichung von Störterm und Ineffizienz und lambda mit Standardfehlern, die "
         "Likelihood, einen Test, ob es überhaupt Ineffizienz gibt, die mittlere Effizienz, die Skalenerträge und "
         "die Konvergenz. Das Ergebnis hängt von der angenommenen Verteilung der Ineffizienz ab; es misst, wie weit "
         "eine Zeile zurückliegt, nicht warum.",
         {germanOutputArgument, germanInputsArgument,
          {"Funktionsform", "\"cobb-douglas\" (Standard) oder \"translog\"."},
          {"Ineffizienz", "Verteilung der Ineffizienz: \"half-normal\" (Standard, halbnormal) oder \"exponential\" "
                          "(exponentialverteilt)."},
          levelArgument, controlsArgument}},
        {"prodEfficiency",
         "Technische Effizienz jeder Zeile aus einer PRODFRONTIER-Tabelle: der erwartete Anteil der Ausbringung an "
         "der Grenze, den die Zeile erreicht (1 = auf der Grenze), oder ihre Ineffizienz oder die Grenzen ihrer "
         "Effizienz. Eine Spalte, ein Wert je Zeile.",
         {{"Modell", "Eine ganze PRODFRONTIER-Tabelle (ihre erste Zelle lautet \"half-normal frontier\" oder "
                     "\"exponential frontier\")."},
          germanOutputArgument,
          {"Faktormengen", "Faktormengen jeder Zeile in der Reihenfolge der Tabelle (danach ihre Kontrollvariablen, "
                           "falls sie welche hat), so viele Zeilen wie die Ausbringung. Eine erste Textzeile benennt "
                           "die Spalten, die dann nach Bezeichnung zugeordnet werden."},
          {"Kennzahl", "\"efficiency\" (Standard: E[exp(-u) | Residuum], Battese und Coelli), \"inefficiency\" "
                       "(E[u | Residuum], Jondrow u. a.), \"lower bound\" oder \"upper bound\" (der Effizienz, "
                       "zum Konfidenzniveau der Tabelle, Horrace und Schmidt)."}}},
        {"prodEnvelope",
         "Data Envelopment Analysis: die Effizienz jeder Zeile (jedes Betriebs) gegenüber der besten Praxis aller "
         "Zeilen, durch lineare Optimierung; mehrere Ausbringungen erlaubt. Eine Spalte, ein Wert je Zeile (1 = auf "
         "dem Rand). Ein Wert gilt nur relativ zu den gegebenen Zeilen: wenige Zeilen und viele Faktoren machen die "
         "Werte hoch.",
         {{"Ausbringungen", "Ausbringungen jeder Zeile, eine Spalte je Ausbringung, Zahlen von null an, jede Zeile "
                            "mit einer positiven. Eine erste Textzeile benennt die Ausbringungen."},
          {"Faktormengen", "Faktormengen jeder Zeile, eine Spalte je Faktor, Zahlen von null an, jede Zeile mit einer "
                           "positiven, so viele Zeilen wie die Ausbringungen. Eine erste Textzeile benennt die "
                           "Faktoren."},
          {"Skalenerträge", "Skalenerträge des Randes: \"constant\" (Standard, konstant), \"variable\" (variabel) "
                            "oder \"non-increasing\" (nicht steigend)."},
          {"Orientierung", "\"input\" (Standard: der Anteil ihrer Faktormengen, den eine Zeile bräuchte) oder "
                           "\"output\" (ihre Ausbringung als Anteil dessen, was sie erzeugen könnte, 1/phi)."},
          {"Kennzahl", "\"score\" (Standard: der Effizienzwert), \"scale efficiency\" (Skaleneffizienz: Wert bei "
                       "konstanten / Wert bei variablen Skalenerträgen), \"peers\" (die Vergleichszeilen und ihre "
                       "Gewichte) oder \"target <Bezeichnung>\" (die Menge dieses Faktors oder dieser Ausbringung "
                       "auf dem Rand, Schlupf eingeschlossen)."},
          {"Namen", "Optionale Spalte mit dem Namen jeder Zeile (Betrieb oder Filiale), so viele Zeilen wie die "
                    "Ausbringungen, eine Kopfzeile erlaubt: Vergleichszeilen werden dann mit diesen Namen statt mit "
                    "Zeilennummern genannt."}}},
    }};
    return translation;
}

} // namespace isoquant::addin
