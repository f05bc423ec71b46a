<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de_DE">
<context>
    <name>Panel</name>
    <message>
        <source>The lab's lasers and their outputs: emission, beam and the ways a person could be exposed.</source>
        <translation>Die Laser des Labors und ihre Ausgänge: Emission, Strahl und die Wege, auf denen eine Person exponiert werden kann.</translation>
    </message>
    <message>
        <source>The eyewear shelf: each item's spectral optical density and its EN 207 / EN 208 markings.</source>
        <translation>Der Schutzbrillenbestand: spektrale optische Dichte und EN-207-/EN-208-Kennzeichnung jedes Stücks.</translation>
    </message>
    <message>
        <source>Live results for the selected laser: exposure limits, hazard distances, required optical density and the eyewear that covers it.</source>
        <translation>Aktuelle Ergebnisse für den gewählten Laser: Expositionsgrenzwerte, Gefährdungsabstände, erforderliche optische Dichte und die Schutzbrillen, die ihn abdecken.</translation>
    </message>
    <message>
        <source>MPE against exposure duration, required and available optical density against wavelength, exposure against distance.</source>
        <translation>MZB über der Expositionsdauer, erforderliche und vorhandene optische Dichte über der Wellenlänge, Exposition über dem Abstand.</translation>
    </message>
    <message>
        <source>The one-page summary of a laser's assessment, to print or export as PDF.</source>
        <translation>Die einseitige Zusammenfassung der Bewertung eines Lasers, zum Drucken oder als PDF.</translation>
    </message>
    <message>
        <source>Dated assessments and their sign-offs.</source>
        <translation>Datierte Bewertungen und ihre Freigaben.</translation>
    </message>
    <message>
        <source>Lasers</source>
        <translation>Laser</translation>
    </message>
    <message>
        <source>Eyewear</source>
        <translation>Schutzbrillen</translation>
    </message>
    <message>
        <source>Assessment</source>
        <translation>Bewertung</translation>
    </message>
    <message>
        <source>Limit curves</source>
        <translation>Grenzwertkurven</translation>
    </message>
    <message>
        <source>Hazard sheet</source>
        <translation>Gefährdungsblatt</translation>
    </message>
    <message>
        <source>History</source>
        <translation>Verlauf</translation>
    </message>
</context>
<context>
    <name>Caution</name>
    <message>
        <source>Caution: these figures follow the published formula structure of the rule set named with them. They support, and never replace, the judgement of your institution's laser safety officer; local regulations and the manufacturer's data take precedence. Check every input before relying on a figure.</source>
        <translation>Vorsicht: Diese Werte folgen dem veröffentlichten Formelaufbau des jeweils genannten Regelwerks. Sie unterstützen das Urteil der oder des Laserschutzbeauftragten Ihrer Einrichtung und ersetzen es nie; örtliche Vorschriften und die Angaben des Herstellers haben Vorrang. Prüfen Sie jede Eingabe, bevor Sie sich auf einen Wert stützen.</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::CautionStrip</name>
    <message>
        <source>Caution: an aid to your laser safety officer, not a substitute. Local rules take precedence.</source>
        <translation>Vorsicht: eine Hilfe für die Laserschutzbeauftragten, kein Ersatz. Örtliche Vorschriften haben Vorrang.</translation>
    </message>
    <message>
        <source>More</source>
        <translation>Mehr</translation>
    </message>
    <message>
        <source>Less</source>
        <translation>Weniger</translation>
    </message>
    <message>
        <source>Show the full caution</source>
        <translation>Ganzen Warnhinweis zeigen</translation>
    </message>
    <message>
        <source>Fold the caution to one line</source>
        <translation>Warnhinweis auf eine Zeile falten</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::MainWindow</name>
    <message>
        <source>%1 — Beamwarden</source>
        <translation>%1 — Beamwarden</translation>
    </message>
    <message>
        <source>Lab file: %1</source>
        <translation>Labordatei: %1</translation>
    </message>
    <message>
        <source>No lab open</source>
        <translation>Kein Labor geöffnet</translation>
    </message>
    <message>
        <source>no file</source>
        <translation>keine Datei</translation>
    </message>
    <message>
        <source>demo lab</source>
        <translation>Demo-Labor</translation>
    </message>
    <message>
        <source>&amp;File</source>
        <translation>&amp;Datei</translation>
    </message>
    <message>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <source>&amp;About Beamwarden</source>
        <translation>&amp;Über Beamwarden</translation>
    </message>
    <message>
        <source>About Beamwarden</source>
        <translation>Über Beamwarden</translation>
    </message>
    <message>
        <source>Rule set: strictest of IEC 60825-1:2014 and IEC 60825-1:2007</source>
        <translation>Regelwerk: strengster Wert aus IEC 60825-1:2014 und IEC 60825-1:2007</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::PanelPage</name>
    <message>
        <source>No lasers in this lab yet.</source>
        <translation>Noch keine Laser in diesem Labor.</translation>
    </message>
    <message>
        <source>No eyewear on the shelf yet.</source>
        <translation>Noch keine Schutzbrillen im Bestand.</translation>
    </message>
    <message>
        <source>Select a laser to see its assessment.</source>
        <translation>Wählen Sie einen Laser, um seine Bewertung zu sehen.</translation>
    </message>
    <message>
        <source>Select a laser to plot its limit curves.</source>
        <translation>Wählen Sie einen Laser, um seine Grenzwertkurven zu zeichnen.</translation>
    </message>
    <message>
        <source>Select a laser to preview its hazard sheet.</source>
        <translation>Wählen Sie einen Laser, um sein Gefährdungsblatt anzuzeigen.</translation>
    </message>
    <message>
        <source>No assessments recorded yet.</source>
        <translation>Noch keine Bewertungen erfasst.</translation>
    </message>
</context>
<context>
    <name>beamwarden::sheet::Sheet</name>
    <message>
        <source>required OD, per band (diamond)</source>
        <translation>erforderliche OD je Band (Raute)</translation>
    </message>
    <message>
        <source>%1 (solid line)</source>
        <translation>%1 (durchgezogene Linie)</translation>
    </message>
    <message>
        <source>%1 (dashed line)</source>
        <translation>%1 (gestrichelte Linie)</translation>
    </message>
    <message>
        <source>no eyewear to compare</source>
        <translation>keine Schutzbrille zum Vergleich</translation>
    </message>
    <message>
        <source>wavelength (µm, log scale)</source>
        <translation>Wellenlänge (µm, logarithmisch)</translation>
    </message>
    <message>
        <source>wavelength (nm, log scale)</source>
        <translation>Wellenlänge (nm, logarithmisch)</translation>
    </message>
    <message>
        <source>within limit</source>
        <translation>unter dem Grenzwert</translation>
    </message>
    <message>
        <source>over limit %1</source>
        <translation>über dem Grenzwert %1</translation>
    </message>
    <message>
        <source>none</source>
        <translation>entfällt</translation>
    </message>
    <message>
        <source>unbounded</source>
        <translation>unbegrenzt</translation>
    </message>
    <message>
        <source>covers</source>
        <translation>schützt</translation>
    </message>
    <message>
        <source>cannot tell</source>
        <translation>nicht beurteilbar</translation>
    </message>
    <message>
        <source>falls short</source>
        <translation>reicht nicht</translation>
    </message>
    <message>
        <source>draft</source>
        <translation>Entwurf</translation>
    </message>
    <message>
        <source>in review</source>
        <translation>in Prüfung</translation>
    </message>
    <message>
        <source>approved</source>
        <translation>freigegeben</translation>
    </message>
    <message>
        <source>withdrawn</source>
        <translation>zurückgezogen</translation>
    </message>
    <message>
        <source>class not recorded</source>
        <translation>Klasse nicht erfasst</translation>
    </message>
    <message>
        <source>Class %1</source>
        <translation>Klasse %1</translation>
    </message>
    <message>
        <source>intrabeam</source>
        <translation>direkter Strahl</translation>
    </message>
    <message>
        <source>through a lens</source>
        <translation>durch eine Linse</translation>
    </message>
    <message>
        <source>from a fibre end</source>
        <translation>aus einem Faserende</translation>
    </message>
    <message>
        <source>diffuse reflection</source>
        <translation>diffuse Reflexion</translation>
    </message>
    <message>
        <source>specular reflection</source>
        <translation>gerichtete Reflexion</translation>
    </message>
    <message>
        <source>through magnifying optics</source>
        <translation>durch vergrößernde Optik</translation>
    </message>
    <message>
        <source>rule 1, single pulse</source>
        <translation>Regel 1, Einzelimpuls</translation>
    </message>
    <message>
        <source>rule 2, average power</source>
        <translation>Regel 2, mittlere Leistung</translation>
    </message>
    <message>
        <source>rule 3, pulse train</source>
        <translation>Regel 3, Impulsfolge</translation>
    </message>
    <message>
        <source>HAZARD SHEET</source>
        <translation>GEFÄHRDUNGSBLATT</translation>
    </message>
    <message>
        <source>%1 hazard sheet (continued)</source>
        <translation>Gefährdungsblatt %1 (Fortsetzung)</translation>
    </message>
    <message>
        <source>Page %1 of %2</source>
        <translation>Seite %1 von %2</translation>
    </message>
    <message>
        <source>%1 to %2</source>
        <translation>%1 bis %2</translation>
    </message>
    <message>
        <source>%1 (band %2)</source>
        <translation>%1 (Band %2)</translation>
    </message>
    <message>
        <source>CW, %1</source>
        <translation>Dauerstrich, %1</translation>
    </message>
    <message>
        <source>%1 pulses at %2, %3 per pulse (%4 mean)</source>
        <translation>Impulse von %1 mit %2, %3 je Impuls (%4 im Mittel)</translation>
    </message>
    <message>
        <source>in bursts of %1 at %2</source>
        <translation>in Gruppen zu %1 mit %2</translation>
    </message>
    <message>
        <source>beam %1 (%2), divergence %3</source>
        <translation>Strahl %1 (%2), Divergenz %3</translation>
    </message>
    <message>
        <source>Gaussian</source>
        <translation>gaußförmig</translation>
    </message>
    <message>
        <source>flat-top</source>
        <translation>Flat-Top</translation>
    </message>
    <message>
        <source>at the exit</source>
        <translation>am Austritt</translation>
    </message>
    <message>
        <source>at %1</source>
        <translation>in %1</translation>
    </message>
    <message>
        <source>%1 exposure</source>
        <translation>%1 Exposition</translation>
    </message>
    <message>
        <source>%1 per pulse</source>
        <translation>%1 je Impuls</translation>
    </message>
    <message>
        <source>both editions</source>
        <translation>beide Ausgaben</translation>
    </message>
    <message>
        <source>hazard radius</source>
        <translation>Gefährdungs­radius</translation>
    </message>
    <message>
        <source>does not end within the model</source>
        <translation>endet nicht innerhalb des Modells</translation>
    </message>
    <message>
        <source>OD margin %1</source>
        <translation>OD-Reserve %1</translation>
    </message>
    <message>
        <source>Eyewear OD</source>
        <translation>OD der Schutzbrille</translation>
    </message>
    <message>
        <source>OD of %1</source>
        <translation>OD von %1</translation>
    </message>
    <message>
        <source>not rated here</source>
        <translation>hier nicht ausgewiesen</translation>
    </message>
    <message>
        <source>%1, enough</source>
        <translation>%1, ausreichend</translation>
    </message>
    <message>
        <source>%1, short by %2</source>
        <translation>%1, es fehlen %2</translation>
    </message>
    <message>
        <source>best on the shelf; it does not cover every output</source>
        <translation>die beste im Bestand; sie schützt nicht vor jedem Ausgang</translation>
    </message>
    <message>
        <source>No eyewear on the shelf: nothing has been checked against this laser.</source>
        <translation>Keine Schutzbrillen im Bestand: Nichts wurde gegen diesen Laser geprüft.</translation>
    </message>
    <message>
        <source>Wear %1: it covers every output.</source>
        <translation>Tragen Sie %1: Sie schützt vor jedem Ausgang.</translation>
    </message>
    <message>
        <source>Also covering: %1.</source>
        <translation>Ebenfalls ausreichend: %1.</translation>
    </message>
    <message>
        <source>No single item covers every output. Wear %1 for %2, and %3 for %4.</source>
        <translation>Keine einzelne Schutzbrille schützt vor jedem Ausgang. Tragen Sie %1 für %2 und %3 für %4.</translation>
    </message>
    <message>
        <source>Nothing on the shelf covers every output.</source>
        <translation>Keine Schutzbrille im Bestand schützt vor jedem Ausgang.</translation>
    </message>
    <message>
        <source>No assessment of this laser is on record: the figures on this sheet are computed from the current inputs and have not been reviewed.</source>
        <translation>Für diesen Laser ist keine Bewertung erfasst: Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet und wurden nicht geprüft.</translation>
    </message>
    <message>
        <source>Assessment %1</source>
        <translation>Bewertung %1</translation>
    </message>
    <message>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <source>by %1</source>
        <translation>von %1</translation>
    </message>
    <message>
        <source>created %1</source>
        <translation>erstellt %1</translation>
    </message>
    <message>
        <source>last changed %1</source>
        <translation>zuletzt geändert %1</translation>
    </message>
    <message>
        <source>computed by Beamwarden %1</source>
        <translation>berechnet mit Beamwarden %1</translation>
    </message>
    <message>
        <source>Out of date: the laser changed after this assessment, so its figures no longer describe it. The figures on this sheet are computed from the current inputs.</source>
        <translation>Veraltet: Der Laser wurde nach dieser Bewertung geändert, ihre Werte beschreiben ihn nicht mehr. Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet.</translation>
    </message>
    <message>
        <source>Not approved yet: the figures on this sheet are computed from the current inputs.</source>
        <translation>Noch nicht freigegeben: Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet.</translation>
    </message>
    <message>
        <source>Earlier assessments on record: %1.</source>
        <translation>Frühere erfasste Bewertungen: %1.</translation>
    </message>
    <message>
        <source>%1 hazard sheet</source>
        <translation>Gefährdungsblatt %1</translation>
    </message>
    <message>
        <source>Room not recorded</source>
        <translation>Raum nicht erfasst</translation>
    </message>
    <message>
        <source>Room %1</source>
        <translation>Raum %1</translation>
    </message>
    <message>
        <source>Laser safety officer: %1</source>
        <translation>Laserschutzbeauftragte(r): %1</translation>
    </message>
    <message>
        <source>not recorded</source>
        <translation>nicht erfasst</translation>
    </message>
    <message>
        <source>serial %1</source>
        <translation>Seriennummer %1</translation>
    </message>
    <message>
        <source>Limits: the stricter of %1 and %2, figure by figure</source>
        <translation>Grenzwerte: für jeden Wert der strengere aus %1 und %2</translation>
    </message>
    <message>
        <source>Limits: %1</source>
        <translation>Grenzwerte: %1</translation>
    </message>
    <message>
        <source>2014 repeated-pulse factor C5: conservative reading</source>
        <translation>Impulsfolgefaktor C5 (2014): konservative Lesart</translation>
    </message>
    <message>
        <source>2014 repeated-pulse factor C5: edition reading</source>
        <translation>Impulsfolgefaktor C5 (2014): Lesart der Ausgabe</translation>
    </message>
    <message>
        <source>Computed by Beamwarden %1 on %2.</source>
        <translation>Berechnet mit Beamwarden %1 am %2.</translation>
    </message>
    <message>
        <source>Caution: the full caution is on page 1. These figures support, and never replace, the judgement of your laser safety officer.</source>
        <translation>Vorsicht: Der vollständige Hinweis steht auf Seite 1. Diese Werte unterstützen das Urteil Ihrer oder Ihres Laserschutzbeauftragten und ersetzen es nie.</translation>
    </message>
    <message>
        <source>Beamwarden %1, %2</source>
        <translation>Beamwarden %1, %2</translation>
    </message>
    <message>
        <source>Outputs and exposure cases</source>
        <translation>Ausgänge und Expositionsfälle</translation>
    </message>
    <message>
        <source>Exposure case</source>
        <translation>Expositionsfall</translation>
    </message>
    <message>
        <source>MPE (governing rule)</source>
        <translation>MZB (maßgebliche Regel)</translation>
    </message>
    <message>
        <source>Eye</source>
        <translation>Auge</translation>
    </message>
    <message>
        <source>Skin</source>
        <translation>Haut</translation>
    </message>
    <message>
        <source>NOHD</source>
        <translation>NOHD</translation>
    </message>
    <message>
        <source>Required OD</source>
        <translation>Erforder­liche OD</translation>
    </message>
    <message>
        <source>Outputs and exposure cases (continued)</source>
        <translation>Ausgänge und Expositionsfälle (Fortsetzung)</translation>
    </message>
    <message>
        <source>Eye, skin: exposure at the worst point against the MPE. NOHD: beyond it the eye stays below the MPE. OD: rounded up, never down.</source>
        <translation>Auge, Haut: Exposition am ungünstigsten Punkt im Vergleich zur MZB. NOHD: jenseits davon bleibt das Auge unter der MZB. OD: aufgerundet, nie abgerundet.</translation>
    </message>
    <message>
        <source>Eyewear</source>
        <translation>Schutzbrillen</translation>
    </message>
    <message>
        <source>A purchase must be marked at least (and reach the required OD below):</source>
        <translation>Eine Neuanschaffung braucht mindestens diese Kennzeichnung (und die erforderliche OD unten):</translation>
    </message>
    <message>
        <source>Wavelength (output)</source>
        <translation>Wellenlänge (Ausgang)</translation>
    </message>
    <message>
        <source>† rests on a reconstructed limit row: see the footnote under the outputs.</source>
        <translation>† beruht auf einer rekonstruierten Grenzwertzeile: siehe Fußnote unter den Ausgängen.</translation>
    </message>
    <message>
        <source>Required OD and eyewear OD</source>
        <translation>Erforderliche OD und OD der Schutzbrille</translation>
    </message>
    <message>
        <source>Eyewear on the shelf</source>
        <translation>Schutzbrillen im Bestand</translation>
    </message>
    <message>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <source>Why (first reason)</source>
        <translation>Warum (erster Grund)</translation>
    </message>
    <message>
        <source>Eyewear on the shelf (continued)</source>
        <translation>Schutzbrillen im Bestand (Fortsetzung)</translation>
    </message>
    <message>
        <source>shown in the plot</source>
        <translation>im Diagramm gezeigt</translation>
    </message>
    <message>
        <source>† Rests on a limit row reconstructed from public material, not read from the standard's text: verify the figure against the standard before relying on it.</source>
        <translation>† Beruht auf einer Grenzwertzeile, die aus öffentlichem Material rekonstruiert und nicht dem Text der Norm entnommen ist: Prüfen Sie den Wert an der Norm, bevor Sie sich darauf stützen.</translation>
    </message>
    <message>
        <source>Assessment record and signatures</source>
        <translation>Bewertung und Unterschriften</translation>
    </message>
    <message>
        <source>When</source>
        <translation>Wann</translation>
    </message>
    <message>
        <source>Who</source>
        <translation>Wer</translation>
    </message>
    <message>
        <source>Status change</source>
        <translation>Statuswechsel</translation>
    </message>
    <message>
        <source>Comment</source>
        <translation>Kommentar</translation>
    </message>
    <message>
        <source>Sign-off history (continued)</source>
        <translation>Freigabeverlauf (Fortsetzung)</translation>
    </message>
    <message>
        <source>Role</source>
        <translation>Rolle</translation>
    </message>
    <message>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <source>Date</source>
        <translation>Datum</translation>
    </message>
    <message>
        <source>Signature</source>
        <translation>Unterschrift</translation>
    </message>
    <message>
        <source>Laser safety officer</source>
        <translation>Laserschutzbeauftragte(r)</translation>
    </message>
    <message>
        <source>Responsible for the laser</source>
        <translation>Verantwortlich für den Laser</translation>
    </message>
    <message>
        <source>User, briefed on this sheet</source>
        <translation>Nutzer(in), anhand dieses Blatts unterwiesen</translation>
    </message>
    <message>
        <source>Withdrawn: this assessment no longer stands. The figures on this sheet are computed from the current inputs.</source>
        <translation>Zurückgezogen: Diese Bewertung gilt nicht mehr. Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet.</translation>
    </message>
    <message>
        <source>Signatures</source>
        <translation>Unterschriften</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::HazardSheetPanel</name>
    <message>
        <source>Paper:</source>
        <translation>Papier:</translation>
    </message>
    <message>
        <source>A4</source>
        <translation>A4</translation>
    </message>
    <message>
        <source>US Letter</source>
        <translation>US Letter</translation>
    </message>
    <message>
        <source>Export PDF…</source>
        <translation>PDF exportieren…</translation>
    </message>
    <message>
        <source>Write the hazard sheet as a PDF file</source>
        <translation>Das Gefährdungsblatt als PDF-Datei schreiben</translation>
    </message>
    <message>
        <source>Print…</source>
        <translation>Drucken…</translation>
    </message>
    <message>
        <source>Print the hazard sheet</source>
        <translation>Das Gefährdungsblatt drucken</translation>
    </message>
    <message>
        <source>Select a laser to preview its hazard sheet.</source>
        <translation>Wählen Sie einen Laser, um sein Gefährdungsblatt anzuzeigen.</translation>
    </message>
    <message>
        <source>No hazard sheet to export: select a laser first.</source>
        <translation>Kein Gefährdungsblatt zum Exportieren: Wählen Sie zuerst einen Laser.</translation>
    </message>
    <message>
        <source>Could not write %1: %2</source>
        <translation>%1 konnte nicht geschrieben werden: %2</translation>
    </message>
    <message>
        <source>Print hazard sheet</source>
        <translation>Gefährdungsblatt drucken</translation>
    </message>
    <message>
        <source>The printer could not be started.</source>
        <translation>Der Drucker konnte nicht gestartet werden.</translation>
    </message>
    <message>
        <source>Export hazard sheet</source>
        <translation>Gefährdungsblatt exportieren</translation>
    </message>
    <message>
        <source>PDF files (*.pdf)</source>
        <translation>PDF-Dateien (*.pdf)</translation>
    </message>
    <message>
        <source>%1 page(s), %2</source>
        <translation>%1 Seite(n), %2</translation>
    </message>
    <message>
        <source>Page %1 of %2</source>
        <translation>Seite %1 von %2</translation>
    </message>
</context>
</TS>
