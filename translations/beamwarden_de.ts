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
</TS>
