// German Function Wizard texts of the decision, cost and efficiency functions (function_texts_de.cxx
// for the rules the texts follow).
#include "function_arguments_de.hxx"

namespace isoquant::addin {

// The producer's decisions.
std::vector<TranslatedFunction> germanDecisionTexts()
{
    return {
    {"prodLeastCost",
     "Kostenminimale Faktormengen, mit denen die Zielausbringung zu den gegebenen Faktorpreisen produziert wird: "
     "eine Menge je Faktor, als Zeile oder Spalte wie die Preise (als Matrixformel eingeben).",
     {modelArgument, targetArgument, pricesArgument, boundsArgument}},
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
    };
}

// Cost: a model's dual and the cost function fitted from the books.
std::vector<TranslatedFunction> germanCostTexts()
{
    return {
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
                       "Ausbringung) oder \"returns to scale\" (deren Kehrwert)."},
          {"Statistik", "\"value\" (Standard: der Wert), \"std. error\" (Standardfehler), \"lower bound\" oder "
                        "\"upper bound\" (untere oder obere Grenze) dieser Kennzahl: nach der Delta-Methode aus dem "
                        "Kovarianzblock einer mit Kovarianz WAHR geschätzten PRODFIT-Tabelle (jede Form) oder "
                        "PRODCOSTFIT-Tabelle, auf deren Niveau und mit deren t-Verteilung. Kosten sind ihrer "
                        "Natur nach positiv: Gesamt-, Grenz- und Durchschnittskosten erhalten Grenzen auf der "
                        "Log-Skala, die nie unter 0 fallen; Kostenelastizität und Skalenerträge den Wert -/+ t mal "
                        "Standardfehler."}}},
        {"prodEfficientScale",
         "Ausbringung, bei der die Durchschnittskosten zu den gegebenen Faktorpreisen am niedrigsten sind (die "
         "effiziente Betriebsgröße), aus einem Kostenmodell (PRODCOSTFIT-Tabelle oder eingetippte Zeilen, wie bei "
         "PRODCOST) oder einem Produktionsmodell, dessen Skalenerträge mit der Größe fallen. Meldet, wenn die "
         "Durchschnittskosten im Modell bei jeder Ausbringung fallen oder steigen.",
         {modelArgument,
          {"Faktorpreise", "Ein positiver Preis je Faktor, in der Reihenfolge des Modells, als Zeile oder Spalte."},
          {"Kennzahl", "\"value\" (Standard: der Wert), \"std. error\" (Standardfehler), \"lower bound\" oder "
                       "\"upper bound\" (untere oder obere Grenze) der effizienten Betriebsgröße: nach der "
                       "Delta-Methode aus dem Kovarianzblock einer mit Kovarianz WAHR geschätzten translog-"
                       "PRODCOSTFIT-Tabelle oder translog-PRODFIT-Tabelle (über deren kostenminimale Pläne), auf "
                       "deren Niveau und mit deren t-Verteilung. Die Betriebsgröße ist "
                       "ihrer Natur nach positiv: ihre Grenzen werden auf der Log-Skala bestimmt und fallen nie "
                       "unter 0."}}},
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
    };
}

// The cost function fitted from the books (PRODCOSTFIT).
std::vector<TranslatedFunction> germanCostFitTexts()
{
    return {
        {"prodCostFit",
         "Schätzt eine Kostenfunktion aus beobachteten Kosten, Ausbringung und Faktorpreisen nach der Methode der "
         "kleinsten Quadrate in Logarithmen, linear homogen in den Preisen, oder mit Ineffizienz eine stochastische "
         "Kostengrenze (die geringsten Kosten, nach der Maximum-Likelihood-Methode). Liefert eine Tabelle (als "
         "Matrixformel eingeben): Schätzwerte mit Standardfehlern, Gütemaße, Kostenelastizität, Skalenerträge mit "
         "Test und Urteil, effiziente Betriebsgröße.",
         {{"Kosten", "Gesamtkosten jeder Zeile (Betrieb, Filiale oder Periode): eine Spalte positiver Zahlen. Eine "
                     "erste Zeile mit Text gilt als Überschrift."},
          {"Ausbringung", "Ausbringungsmenge jeder Zeile: eine Spalte positiver Zahlen, so viele Zeilen wie bei den "
                          "Kosten."},
          {"Faktorpreise", "Die Preise, die jede Zeile für ihre Faktoren gezahlt hat, eine Spalte je Faktor, positive "
                           "Zahlen, so viele Zeilen wie bei den Kosten. Eine erste Zeile mit Text benennt die "
                           "Faktoren; die Homogenität wird durch Division durch den letzten Preis erzwungen."},
          {"Funktionsform", "\"cobb-douglas\" (Standard) oder \"translog\"."},
          {"Kostenanteile",
           "Optionale Kostenanteile der Faktoren, eine Spalte je Preis in derselben Reihenfolge, so "
           "viele Zeilen wie bei den Kosten, jede Zeile mit Summe 1 auf 0,01 genau (Anteile). Angegeben, "
           "werden die Kostengleichung und alle Anteilsgleichungen bis auf die letzte gemeinsam nach "
           "iterierter verallgemeinerter Methode der kleinsten Quadrate geschätzt (scheinbar "
           "unverbundene Regressionen)."},
          {"Standardfehler",
           "Standardfehler: \"classical\" (Standard), \"hc1\" oder \"hc3\" (robust gegen "
           "Heteroskedastizität) oder \"cluster\" (nach den Gruppen; Tests mit G - 1 Freiheitsgraden); "
           "andere als classical nur ohne Kostenanteile und ohne Ineffizienz."},
          levelArgument,
          {"Kontrollvariablen", "Optionale weitere Spalten, unlogarithmiert in ln Kosten aufgenommen (eine Quote, eine "
                                "0/1-Variable), so viele Zeilen wie bei den Kosten; PRODCOST nimmt dann die Konstante "
                                "bei ihren Mittelwerten."},
          {"Gruppen", "Optionale Spalte, die Betrieb oder Unternehmen jeder Zeile benennt (Zahlen oder Texte), so "
                      "viele Zeilen wie bei den Kosten, eine Überschrift erlaubt. Nötig für Effekte und für "
                      "\"cluster\"-Standardfehler. Nicht mit Ineffizienz."},
          {"Effekte", "\"none\" (Standard), \"fixed\" (ein Effekt je Gruppe, Within-Schätzer) oder \"two-way\" "
                      "(Gruppen- und Periodeneffekte; die Perioden kommen aus dem Trend). Nicht mit Kostenanteilen "
                      "oder Ineffizienz."},
          {"Trend", "Optionale Spalte der Perioden (Jahre), so viele Zeilen wie bei den Kosten: fügt einen Zeittrend "
                    "hinzu, ausgewiesen als Kostenänderung je Periode bei gegebener Ausbringung und gegebenen Preisen "
                    "(negativ: die Kosten sinken). Mit \"two-way\"-Effekten liefert sie stattdessen die Perioden. "
                    "Nicht mit Ineffizienz."},
          {"unvollständige Zeilen", "WAHR, um Zeilen mit einer leeren oder Text-Zelle in Kosten, Ausbringung, "
                                    "Faktorpreisen, Kostenanteilen, Kontrollvariablen oder Trend oder einer leeren "
                                    "Zelle in Gruppen auszulassen (die Tabelle zählt sie); FALSCH oder leer: eine "
                                    "solche Zelle ist ein Fehler."},
          {"Ineffizienz", "Leer (Standard): die durchschnittliche Kostenfunktion. \"half-normal\" (halbnormal) "
                          "oder \"exponential\" (exponentialverteilt): eine Kostengrenze, ln Kosten = Grenze + "
                          "Störterm + Ineffizienz, deren Tabelle Standardabweichung von Störterm und Ineffizienz, "
                          "lambda, den Ineffizienztest, die mittlere Effizienz und die Konvergenz ergänzt; "
                          "PRODEFFICIENCY gibt dann die Kosteneffizienz jeder Zeile. Nicht mit Kostenanteilen oder "
                          "Panel-Optionen; Kontrollvariablen sind erlaubt."},
          {"Kovarianz", "WAHR, um unter der Tabelle die geschätzte Kovarianzmatrix der Parameter anzufügen (der unter "
                        "Standardfehler gewählten Art), eine Zeile je Parameter, damit die Statistik von PRODCOST "
                        "Grenzen aus dieser Tabelle liefert; mit Kontrollvariablen, Effekten oder Trend eine Zeile "
                        "mehr, die Konstante für Vorhersagen. Die Tabelle ist dann max(7, q + 1) Spalten breit und "
                        "1 + q Zeilen länger, q diese Zeilen (mit Ineffizienz die inverse beobachtete Information; "
                        "ihre Kopfzeile sagt likelihood und normal). FALSCH oder leer: kein Block."}}},
    };
}

// How far each row is from best practice.
std::vector<TranslatedFunction> germanEfficiencyTexts()
{
    return {
        {"prodFrontier",
         "Schätzt eine stochastische Produktionsgrenze nach der Maximum-Likelihood-Methode: ln Ausbringung = "
         "Grenze + Störterm - Ineffizienz. Gibt eine Tabelle zurück (als Matrixformel eingeben): die Schätzwerte "
         "der Grenze, Standardabweichung von Störterm und Ineffizienz und lambda mit Standardfehlern, die "
         "Likelihood, einen Test, ob es überhaupt Ineffizienz gibt, die mittlere Effizienz, die Skalenerträge und "
         "die Konvergenz. Das Ergebnis hängt von der angenommenen Verteilung der Ineffizienz ab; es misst, wie weit "
         "eine Zeile zurückliegt, nicht warum.",
         {germanOutputArgument,
          germanInputsArgument,
          {"Funktionsform", "\"cobb-douglas\" (Standard) oder \"translog\"."},
          {"Ineffizienz", "Verteilung der Ineffizienz: \"half-normal\" (Standard, halbnormal) oder \"exponential\" "
                          "(exponentialverteilt)."},
          levelArgument,
          controlsArgument,
          {"Kovarianz", "WAHR, um unter der Tabelle die geschätzte Kovarianzmatrix der Koeffizienten der Grenze "
                        "anzufügen (die inverse beobachtete Information; ihre Kopfzeile sagt likelihood und normal), "
                        "eine Zeile je Koeffizient; die Tabelle ist dann max(7, p + 1) Spalten breit und 1 + p Zeilen "
                        "länger. FALSCH oder leer: kein Block."}}},
        {"prodEfficiency",
         "Technische Effizienz jeder Zeile aus einer PRODFRONTIER-Tabelle: der erwartete Anteil der Ausbringung an "
         "der Grenze, den die Zeile erreicht (1 = auf der Grenze), oder ihre Ineffizienz oder die Grenzen ihrer "
         "Effizienz. Aus einer PRODCOSTFIT-Kostengrenze die Kosteneffizienz: das erwartete Verhältnis der "
         "geringsten Kosten zu den Kosten der Zeile (höchstens 1). Eine Spalte, ein Wert je Zeile.",
         {{"Modell", "Eine ganze PRODFRONTIER-Tabelle (ihre erste Zelle lautet \"half-normal frontier\" oder "
                     "\"exponential frontier\") oder eine mit Ineffizienz geschätzte PRODCOSTFIT-Tabelle "
                     "(\"half-normal cost frontier\" oder \"exponential cost frontier\")."},
          {"Ausbringung", "Ausbringungsmenge jeder Zeile: eine Spalte positiver Zahlen. Bei einer Kostengrenze "
                          "stattdessen die Kosten jeder Zeile."},
          {"Faktormengen", "Faktormengen jeder Zeile in der Reihenfolge der Tabelle (danach ihre Kontrollvariablen, "
                           "falls sie welche hat), so viele Zeilen wie die Ausbringung. Eine erste Textzeile benennt "
                           "die Spalten, die dann nach Bezeichnung zugeordnet werden. Bei einer Kostengrenze die "
                           "Spalte der Ausbringung, danach die Preisspalten in der Reihenfolge von PRODCOSTFIT."},
          {"Kennzahl", "\"efficiency\" (Standard: E[exp(-u) | Residuum], Battese und Coelli), \"inefficiency\" "
                       "(E[u | Residuum], Jondrow u. a.), \"lower bound\" oder \"upper bound\" (der Effizienz, "
                       "zum Konfidenzniveau der Tabelle, Horrace und Schmidt; bei gegebenem Residuum und "
                       "geschätzten Parametern, ohne deren Schätzunsicherheit)."}}},
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
    };
}

} // namespace isoquant::addin
