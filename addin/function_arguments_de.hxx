// The German Function Wizard texts' shared argument rows and families (function_texts_de*.cxx),
// private to the add-in.
#pragma once

#include "wizard_texts.hxx"

#include <string_view>
#include <vector>

namespace isoquant::addin {

// Arguments shared by PRODFIT and PRODSTAT.
inline constexpr ArgumentInfo germanOutputArgument{
    "Ausbringung", "Ausbringungsmenge jeder Zeile (Betrieb, Filiale oder Periode): eine Spalte positiver Zahlen. "
                   "Eine erste Zeile mit Text gilt als Überschrift."};
inline constexpr ArgumentInfo germanInputsArgument{
    "Faktormengen", "Faktoreinsatzmengen jeder Zeile, eine Spalte je Produktionsfaktor (Arbeit, Kapital, …), positive "
                    "Zahlen, so viele Zeilen wie bei der Ausbringung. Eine erste Zeile mit Text benennt die Faktoren."};
inline constexpr ArgumentInfo formArgument{
    "Funktionsform", "Funktionsform: \"cobb-douglas\" (Standard), \"ces\" (genau zwei Faktoren, nichtlineare Methode "
                     "der kleinsten Quadrate) oder \"translog\"."};
inline constexpr ArgumentInfo constantReturnsArgument{
    "konstante Skalenerträge", "WAHR, um konstante Skalenerträge vorzugeben (Exponenten mit Summe 1); FALSCH oder "
                               "leer, um sie frei zu schätzen."};
inline constexpr ArgumentInfo errorsArgument{
    "Standardfehler", "Standardfehler: \"classical\" (Standard), \"hc1\" oder \"hc3\" (robust gegen "
                      "Heteroskedastizität) oder \"cluster\" (robust innerhalb jeder Gruppe des Arguments Gruppen; "
                      "Tests rechnen dann bei G Gruppen mit G - 1 Freiheitsgraden)."};
inline constexpr ArgumentInfo levelArgument{
    "Konfidenzniveau", "Konfidenzniveau der Konfidenzintervalle und des Urteils über die Skalenerträge, zwischen 0 "
                       "und 1 (Standard 0,95)."};
inline constexpr ArgumentInfo controlsArgument{
    "Kontrollvariablen", "Optionale zusätzliche Spalten, unlogarithmiert aufgenommen (eine Quote, eine "
                         "0/1-Dummyvariable), so viele Zeilen wie bei der Ausbringung."};
inline constexpr ArgumentInfo groupsArgument{
    "Gruppen", "Optionale Spalte, die den Betrieb oder das Unternehmen jeder Zeile nennt (Zahlen oder Texte), so viele "
               "Zeilen wie bei der Ausbringung, eine Überschriftszeile erlaubt. Nötig für Effekte und für "
               "\"cluster\"-Standardfehler."};
inline constexpr ArgumentInfo effectsArgument{
    "Effekte", "\"none\" (Standard: Gruppen bilden nur die Cluster), \"fixed\" (ein Effekt je Gruppe, "
               "Within-Schätzer) oder \"two-way\" (Gruppen- und Periodeneffekte; die Perioden kommen aus Trend)."};
inline constexpr ArgumentInfo trendArgument{
    "Trend", "Optionale Spalte der Perioden (Jahre), so viele Zeilen wie bei der Ausbringung: fügt einen Zeittrend "
             "hinzu, ausgewiesen als Rate des technischen Fortschritts je Periode (bei Datumswerten je Tag: für Jahre "
             "=JAHR(Datum) verwenden). Bei \"two-way\"-Effekten liefert die Spalte stattdessen die Perioden."};
inline constexpr ArgumentInfo incompleteRowsArgument{
    "unvollständige Zeilen", "WAHR, um Zeilen mit einer leeren oder einer Textzelle auszulassen (die Tabelle zählt "
                             "sie); FALSCH oder leer: eine solche Zelle ist ein Fehler. Leere Zeilen unter den Daten "
                             "beenden diese in jedem Fall (ganze Spalten funktionieren). Eine Zelle mit einem "
                             "Fehlerwert (#NV) lässt Calc schon vor dem Aufruf abbrechen (Err:504)."};
// The optional last argument of PRODGROWTH and PRODINDEX.
inline constexpr ArgumentInfo periodNamesArgument{
    "Perioden", "Optional: Jahr oder Name jeder Periode (Zahlen oder Texte), so viele Zeilen wie Perioden, eine "
                "Überschriftszeile erlaubt. Sie beschriften die Zeilen der Tabelle und die Meldungen anstelle von 2, "
                "3, …."};
inline constexpr ArgumentInfo modelArgument{
    "Modell", "Eine PRODFIT-Tabelle oder eine von Hand eingegebene Tabelle, Bezeichnungen in der ersten Spalte, Werte "
              "in der zweiten. Zeile 1: form | cobb-douglas (oder ces, translog). Zeile 2: A | Wert (oder ln A | "
              "Wert). Cobb-douglas: dann eine Zeile je Faktor, seine Bezeichnung | sein Exponent. Ces: dann Zeilen "
              "delta, sigma (oder rho) und nu, optional eine Zeile inputs | Bezeichnung 1 | Bezeichnung 2. Translog: "
              "dann eine Zeile je Faktor (Bezeichnung | Koeffizient erster Ordnung) und eine je Paar i <= j "
              "(Bezeichnung*Bezeichnung | Koeffizient, 0 ohne Wechselwirkung). Eine optionale Zeile smearing factor "
              "dient dem Mittelwert von PRODOUTPUT."};
inline constexpr ArgumentInfo bundlesArgument{
    "Faktormengen", "Eine Zeile von Faktormengen in der Faktorreihenfolge des Modells oder mehrere Zeilen: das "
                    "Ergebnis ist dann eine Spalte mit einem Wert je Zeile."};
inline constexpr ArgumentInfo inputArgument{"Faktor",
                                     "Welcher Faktor: seine Nummer (1 für den ersten) oder seine Bezeichnung."};
inline constexpr ArgumentInfo boundsArgument{
    "Kennzahl", "\"value\" (Standard: der Wert), \"std. error\" (Standardfehler), \"lower bound\" oder \"upper "
                "bound\" (untere oder obere Grenze): nach der Delta-Methode aus dem Kovarianzblock einer mit Kovarianz "
                "WAHR geschätzten PRODFIT-Tabelle, auf deren Niveau und mit deren t-Verteilung; Ausbringung, "
                "Grenzprodukte, kostenminimale und budgetoptimale Mengen, TFP und Grenzraten der Substitution "
                "erhalten Grenzen auf der Log-Skala. Jede Form: cobb-douglas, translog und "
                "ces."};

// Arguments shared by the decision functions.
inline constexpr ArgumentInfo firstInputArgument{"Faktor i", "Der erste Faktor: seine Nummer (1 für den ersten) oder seine "
                                                      "Bezeichnung."};
inline constexpr ArgumentInfo secondInputArgument{"Faktor j", "Der zweite Faktor: seine Nummer oder seine Bezeichnung."};
inline constexpr ArgumentInfo targetArgument{"Zielausbringung", "Die zu produzierende Ausbringungsmenge, eine positive Zahl."};
inline constexpr ArgumentInfo pricesArgument{
    "Faktorpreise", "Ein positiver Preis je Faktor in der Faktorreihenfolge des Modells: eine Zeile von Preisen "
                    "ergibt eine Zeile von Ergebnissen, eine Spalte eine Spalte."};

std::vector<TranslatedFunction> germanFittingTexts();
std::vector<TranslatedFunction> germanGrowthTexts();
std::vector<TranslatedFunction> germanShapeTexts();
std::vector<TranslatedFunction> germanDecisionTexts();
std::vector<TranslatedFunction> germanCostTexts();
std::vector<TranslatedFunction> germanCostFitTexts();
std::vector<TranslatedFunction> germanEfficiencyTexts();

} // namespace isoquant::addin
