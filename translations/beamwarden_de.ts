<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="de_DE">
<context>
    <name>Caution</name>
    <message>
        <location filename="../app/gui/widgets/cautionstrip.cpp" line="14"/>
        <source>Caution: these figures follow the published formula structure of the rule set named with them. They support, and never replace, the judgement of your institution&apos;s laser safety officer; local regulations and the manufacturer&apos;s data take precedence. Check every input before relying on a figure.</source>
        <translation>Vorsicht: Diese Werte folgen dem veröffentlichten Formelaufbau des jeweils genannten Regelwerks. Sie unterstützen das Urteil der oder des Laserschutzbeauftragten Ihrer Einrichtung und ersetzen es nie; örtliche Vorschriften und die Angaben des Herstellers haben Vorrang. Prüfen Sie jede Eingabe, bevor Sie sich auf einen Wert stützen.</translation>
    </message>
</context>
<context>
    <name>Commands</name>
    <message>
        <location filename="../app/gui/document/commands.cpp" line="36"/>
        <source>Add laser %1</source>
        <translation>Laser %1 hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/document/commands.cpp" line="55"/>
        <source>Remove laser %1</source>
        <translation>Laser %1 entfernen</translation>
    </message>
    <message>
        <location filename="../app/gui/document/commands.cpp" line="104"/>
        <source>Add eyewear %1</source>
        <translation>Schutzbrille %1 hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/document/commands.cpp" line="120"/>
        <source>Remove eyewear %1</source>
        <translation>Schutzbrille %1 entfernen</translation>
    </message>
</context>
<context>
    <name>LimitCurveContent</name>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="24"/>
        <source>Intrabeam viewing</source>
        <translation>Direkter Strahl</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="26"/>
        <source>Behind a lens</source>
        <translation>Hinter einer Linse</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="28"/>
        <source>From a fibre end</source>
        <translation>Aus einem Faserende</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="30"/>
        <source>Diffuse reflection</source>
        <translation>Diffuse Reflexion</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="32"/>
        <source>Mirror-like reflection</source>
        <translation>Gerichtete Reflexion</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="34"/>
        <source>Through magnifying optics</source>
        <translation>Durch vergrößernde Optik</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="43"/>
        <source>Distance from the lens</source>
        <translation>Abstand von der Linse</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="46"/>
        <source>Distance from the reflecting surface</source>
        <translation>Abstand von der reflektierenden Fläche</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="52"/>
        <source>Distance from the exit</source>
        <translation>Abstand vom Austritt</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="77"/>
        <source>Exposure against distance: NOHD %1</source>
        <translation>Exposition über dem Abstand: NOHD %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="81"/>
        <source>Exposure against distance: NOHD 0</source>
        <translation>Exposition über dem Abstand: NOHD 0</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="82"/>
        <source>Below the MPE everywhere.</source>
        <translation>Überall unterhalb der MZB.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="86"/>
        <source>Exposure against distance: NOHD unbounded</source>
        <translation>Exposition über dem Abstand: NOHD unbegrenzt</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="87"/>
        <source>Above the MPE at every distance.</source>
        <translation>In jedem Abstand oberhalb der MZB.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="93"/>
        <source>On-axis exposure per pulse</source>
        <translation>Axiale Bestrahlung je Impuls</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="93"/>
        <source>On-axis irradiance</source>
        <translation>Axiale Bestrahlungsstärke</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="113"/>
        <source>MPE at each distance (worst point: %1)</source>
        <translation>MZB je Abstand (ungünstigster Punkt: %1)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="134"/>
        <source>MPE, lines combined: %1</source>
        <translation>MZB, alle Linien: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="134"/>
        <source>MPE: %1</source>
        <translation>MZB: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="137"/>
        <source>MPE</source>
        <translation>MZB</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="142"/>
        <source>NOHD %1</source>
        <translation>NOHD %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="146"/>
        <source>worst point at %1</source>
        <translation>ungünstigster Punkt bei %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="147"/>
        <source>worst point at 0 m, drawn from 1 cm</source>
        <translation>ungünstigster Punkt 0 m, ab 1 cm gezeichnet</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="148"/>
        <source>%1, %2; MPE for a %3 exposure.</source>
        <translation>%1, %2; MZB für %3 Exposition.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="153"/>
        <source>H per pulse (J/m²)</source>
        <translation>H je Impuls (J/m²)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/distancecurve.cpp" line="153"/>
        <source>Irradiance E (W/m²)</source>
        <translation>Bestrahlungsstärke E (W/m²)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="35"/>
        <source>single-pulse rule</source>
        <translation>Einzelimpulsregel</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="37"/>
        <source>average-power rule</source>
        <translation>Regel der mittleren Leistung</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="39"/>
        <source>repeated-pulse rule</source>
        <translation>Pulsfolgeregel</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="47"/>
        <source>small source</source>
        <translation>kleine Quelle</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="48"/>
        <source>apparent source %1</source>
        <translation>scheinbare Quelle %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="125"/>
        <source>Eye, strictest</source>
        <translation>Auge, strengster Wert</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="126"/>
        <source>Eye, %1</source>
        <translation>Auge, %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="136"/>
        <source>Eye, %1 only</source>
        <translation>Auge, nur %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="142"/>
        <source>Skin</source>
        <translation>Haut</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="165"/>
        <source>One pulse, %1</source>
        <translation>Einzelimpuls, %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="167"/>
        <source>Per pulse in the train (%1)</source>
        <translation>Je Impuls der Pulsfolge (%1)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="171"/>
        <source>one pulse: %1</source>
        <translation>Einzelimpuls: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="174"/>
        <source>per pulse in the train: %1</source>
        <translation>je Impuls der Pulsfolge: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="183"/>
        <source>Exposure basis %1</source>
        <translation>Bezugsdauer %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="185"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="191"/>
        <source>eye</source>
        <translation>Auge</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="193"/>
        <source>skin</source>
        <translation>Haut</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="197"/>
        <source>MPE against exposure duration at %1</source>
        <translation>MZB über der Expositionsdauer bei %1</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="198"/>
        <source>MPE against exposure duration at %1, the band&apos;s governing wavelength</source>
        <translation>MZB über der Expositionsdauer bei %1, der maßgeblichen Wellenlänge des Bands</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="200"/>
        <source>Curves for single exposures, %1.</source>
        <translation>Kurven für Einzelexpositionen, %1.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="203"/>
        <source>Marks: %1 pulses at %2 over the %3 exposure basis.</source>
        <translation>Markierungen: Impulse von %1 mit %2 über die Bezugsdauer von %3.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="207"/>
        <source>Parts rest on reconstructed table rows: check them against the standard.</source>
        <translation>Teile beruhen auf rekonstruierten Tabellenzeilen: Prüfen Sie sie an der Norm.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="209"/>
        <source>Exposure duration</source>
        <translation>Expositionsdauer</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/mpecurve.cpp" line="215"/>
        <source>MPE as H (J/m²)</source>
        <translation>MZB als H (J/m²)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="68"/>
        <source>Required and available optical density against wavelength</source>
        <translation>Erforderliche und vorhandene optische Dichte über der Wellenlänge</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="99"/>
        <source>Required OD</source>
        <translation>Erforderliche OD</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="108"/>
        <source>OD %1 required</source>
        <translation>OD %1 erforderlich</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="108"/>
        <source>no OD required</source>
        <translation>keine OD erforderlich</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="174"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="186"/>
        <source>The eyewear shelf is empty.</source>
        <translation>Der Schutzbrillenbestand ist leer.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="188"/>
        <source>No OD data from %1 to %2 nm: %3.</source>
        <translation>Keine OD-Daten von %1 bis %2 nm: %3.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="190"/>
        <source>Markings that could not be read: %1.</source>
        <translation>Nicht lesbare Kennzeichnungen: %1.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="193"/>
        <source>%1 of the %2 shelf items shown, those that protect best first.</source>
        <translation>%1 der %2 Schutzbrillen im Bestand gezeigt, die am besten schützenden zuerst.</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="195"/>
        <source>Wavelength (nm)</source>
        <translation>Wellenlänge (nm)</translation>
    </message>
    <message>
        <location filename="../app/gui/plots/odcurve.cpp" line="197"/>
        <source>Optical density</source>
        <translation>Optische Dichte</translation>
    </message>
</context>
<context>
    <name>Panel</name>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="32"/>
        <source>The lab&apos;s lasers and their outputs: emission, beam and the ways a person could be exposed.</source>
        <translation>Die Laser des Labors und ihre Ausgänge: Emission, Strahl und die Wege, auf denen eine Person exponiert werden kann.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="35"/>
        <source>The eyewear shelf: each item&apos;s spectral optical density and its EN 207 / EN 208 markings.</source>
        <translation>Der Schutzbrillenbestand: spektrale optische Dichte und EN-207-/EN-208-Kennzeichnung jedes Stücks.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="38"/>
        <source>Live results for the selected laser: exposure limits, hazard distances, required optical density and the eyewear that covers it.</source>
        <translation>Aktuelle Ergebnisse für den gewählten Laser: Expositionsgrenzwerte, Gefährdungsabstände, erforderliche optische Dichte und die Schutzbrillen, die ihn abdecken.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="42"/>
        <source>MPE against exposure duration, required and available optical density against wavelength, exposure against distance.</source>
        <translation>MZB über der Expositionsdauer, erforderliche und vorhandene optische Dichte über der Wellenlänge, Exposition über dem Abstand.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="45"/>
        <source>The one-page summary of a laser&apos;s assessment, to print or export as PDF.</source>
        <translation>Die einseitige Zusammenfassung der Bewertung eines Lasers, zum Drucken oder als PDF.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="48"/>
        <source>Dated assessments and their sign-offs.</source>
        <translation>Datierte Bewertungen und ihre Freigaben.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="11"/>
        <source>Lasers</source>
        <translation>Laser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="13"/>
        <source>Eyewear</source>
        <translation>Schutzbrillen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="15"/>
        <source>Assessment</source>
        <translation>Bewertung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="17"/>
        <source>Limit curves</source>
        <translation>Grenzwertkurven</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="19"/>
        <source>Hazard sheet</source>
        <translation>Gefährdungsblatt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panel.cpp" line="21"/>
        <source>History</source>
        <translation>Verlauf</translation>
    </message>
</context>
<context>
    <name>Startup</name>
    <message>
        <location filename="../app/gui/startup.cpp" line="40"/>
        <source>Beamwarden: exposure limits, hazard distances and eyewear for laser labs.</source>
        <translation>Beamwarden: Expositionsgrenzwerte, Gefährdungsabstände und Laserschutzbrillen für Laserlabore.</translation>
    </message>
    <message>
        <location filename="../app/gui/startup.cpp" line="44"/>
        <source>Open the demo lab.</source>
        <translation>Das Demo-Labor öffnen.</translation>
    </message>
    <message>
        <location filename="../app/gui/startup.cpp" line="47"/>
        <source>Render the main window to FILE (PNG) after start-up, then exit.</source>
        <translation>Nach dem Start das Hauptfenster als FILE (PNG) speichern, dann beenden.</translation>
    </message>
    <message>
        <location filename="../app/gui/startup.cpp" line="50"/>
        <source>User-interface language, e.g. en or de.</source>
        <translation>Sprache der Oberfläche, z. B. en oder de.</translation>
    </message>
    <message>
        <location filename="../app/gui/startup.cpp" line="52"/>
        <location filename="../app/gui/startup.cpp" line="68"/>
        <source>Lab file to open.</source>
        <translation>Zu öffnende Labordatei.</translation>
    </message>
    <message>
        <location filename="../app/gui/startup.cpp" line="56"/>
        <source>Panel to show: Lasers, Eyewear, Assessment, Limit curves, Hazard sheet, History.</source>
        <translation>Anzuzeigender Bereich: Lasers, Eyewear, Assessment, Limit curves, Hazard sheet, History (oder der deutsche Name, z. B. Gefährdungsblatt).</translation>
    </message>
    <message>
        <location filename="../app/gui/startup.cpp" line="60"/>
        <source>Laser to select, by name.</source>
        <translation>Auszuwählender Laser, nach Namen.</translation>
    </message>
</context>
<context>
    <name>Verdict</name>
    <message>
        <source>covers</source>
        <translation>schützt</translation>
    </message>
    <message>
        <source>cannot tell</source>
        <translation>nicht prüfbar</translation>
    </message>
    <message>
        <source>falls short</source>
        <translation>reicht nicht</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::AssessmentPanel</name>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="46"/>
        <source>OD %1 at %2</source>
        <translation>OD %1 bei %2</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="74"/>
        <source>covers</source>
        <translation>schützt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="76"/>
        <source>cannot tell</source>
        <translation>nicht prüfbar</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="78"/>
        <source>falls short</source>
        <translation>reicht nicht</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="86"/>
        <source>within limit</source>
        <translation>innerhalb des Grenzwerts</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="89"/>
        <source>over limit %1</source>
        <translation>über dem Grenzwert %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="98"/>
        <source>0 m (below the MPE from the exit on)</source>
        <translation>0 m (ab Austritt unter der MZB)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="100"/>
        <source>no finite distance</source>
        <translation>kein endlicher Abstand</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="109"/>
        <source>%1 per pulse</source>
        <translation>%1 je Impuls</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="139"/>
        <source>Output / exposure case</source>
        <translation>Ausgang / Expositionsfall</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="139"/>
        <source>MPE (eye)</source>
        <translation>MZB (Auge)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="139"/>
        <source>Exposure</source>
        <translation>Exposition</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="139"/>
        <source>Eye</source>
        <translation>Auge</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="139"/>
        <source>Skin</source>
        <translation>Haut</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="140"/>
        <source>NOHD</source>
        <translation>NOHD</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="140"/>
        <source>Required OD</source>
        <translation>Erforderliche OD</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="146"/>
        <source>Eyewear</source>
        <translation>Schutzbrille</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="146"/>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="146"/>
        <source>Margin (OD)</source>
        <translation>Reserve (OD)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="161"/>
        <source>Select a result to see how it was formed.</source>
        <translation>Wählen Sie ein Ergebnis, um zu sehen, wie es zustande kommt.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="184"/>
        <source>No laser selected</source>
        <translation>Kein Laser gewählt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="197"/>
        <source>Not assessed: %1</source>
        <translation>Nicht bewertet: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="225"/>
        <source>%1 — %2</source>
        <translation>%1 — %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="239"/>
        <source>%1 and %n more</source>
        <translation>
            <numerusform>%1 und %n weitere</numerusform>
            <numerusform>%1 und %n weitere</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="240"/>
        <source>Covered by: %1.</source>
        <translation>Ausreichender Schutz durch: %1.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="244"/>
        <source>No single item covers every output; together %1 and %2 do.</source>
        <translation>Keine einzelne Schutzbrille schützt vor jedem Ausgang; %1 und %2 zusammen schon.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="249"/>
        <source>Nothing on the shelf covers this laser.</source>
        <translation>Keine Schutzbrille im Bestand schützt vor diesem Laser.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="249"/>
        <source>A purchase needs, per output:</source>
        <translation>Eine Neuanschaffung braucht je Ausgang:</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="340"/>
        <source>How this figure was formed</source>
        <translation>Wie dieser Wert zustande kommt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="342"/>
        <source>MPE %1 at %2 (%3), governed by %4.</source>
        <translation>MZB %1 bei %2 (%3), maßgeblich: %4.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="344"/>
        <source>single exposure</source>
        <translation>Einzelexposition</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="345"/>
        <source>both rule sets (equal)</source>
        <translation>beide Regelwerke (gleich)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="356"/>
        <source> per pulse</source>
        <translation> je Impuls</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="359"/>
        <source>Exposure and distance</source>
        <translation>Exposition und Abstand</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/assessmentpanel.cpp" line="362"/>
        <source>NOHD model: %1</source>
        <translation>NOHD-Modell: %1</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::CaseEditor</name>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="36"/>
        <source>intrabeam (direct)</source>
        <translation>direkter Strahl</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="38"/>
        <source>behind a lens</source>
        <translation>hinter einer Linse</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="40"/>
        <source>fibre end</source>
        <translation>Faserende</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="42"/>
        <source>diffuse reflection</source>
        <translation>diffuse Reflexion</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="44"/>
        <source>specular reflection</source>
        <translation>gerichtete Reflexion</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="46"/>
        <source>through magnifying optics</source>
        <translation>durch vergrößernde Optik</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="62"/>
        <source>Add case</source>
        <translation>Fall hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="63"/>
        <source>Remove case</source>
        <translation>Fall entfernen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="70"/>
        <source>default: 100 s (30000 s below 400 nm)</source>
        <translation>Standard: 100 s (30000 s unter 400 nm)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="73"/>
        <source>closest approach; empty: at the exit</source>
        <translation>geringster Abstand; leer: am Austritt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="91"/>
        <source>Case name</source>
        <translation>Name des Falls</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="92"/>
        <source>Viewing</source>
        <translation>Betrachtung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="93"/>
        <source>Exposure duration</source>
        <translation>Expositionsdauer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="94"/>
        <source>Distance</source>
        <translation>Abstand</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="95"/>
        <source>Focal length</source>
        <translation>Brennweite</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="96"/>
        <source>Numerical aperture</source>
        <translation>Numerische Apertur</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="97"/>
        <source>Reflectance</source>
        <translation>Reflexionsgrad</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="98"/>
        <source>Viewing angle</source>
        <translation>Betrachtungswinkel</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="99"/>
        <source>Magnification</source>
        <translation>Vergrößerung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="100"/>
        <source>Objective diameter</source>
        <translation>Objektivdurchmesser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="101"/>
        <source>Transmission</source>
        <translation>Transmission</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="110"/>
        <source>intrabeam at the exit</source>
        <translation>direkter Strahl am Austritt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="111"/>
        <source>add exposure case</source>
        <translation>Expositionsfall hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="118"/>
        <source>remove exposure case</source>
        <translation>Expositionsfall entfernen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="123"/>
        <source>case name</source>
        <translation>Name des Falls</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="130"/>
        <source>viewing</source>
        <translation>Betrachtung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="143"/>
        <source>exposure duration</source>
        <translation>Expositionsdauer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="145"/>
        <source>distance</source>
        <translation>Abstand</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="148"/>
        <source>focal length</source>
        <translation>Brennweite</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="151"/>
        <source>numerical aperture</source>
        <translation>Numerische Apertur</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="153"/>
        <source>reflectance</source>
        <translation>Reflexionsgrad</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="156"/>
        <source>viewing angle</source>
        <translation>Betrachtungswinkel</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="158"/>
        <source>magnification</source>
        <translation>Vergrößerung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="162"/>
        <source>objective diameter</source>
        <translation>Objektivdurchmesser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="164"/>
        <source>transmission</source>
        <translation>Transmission</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/caseeditor.cpp" line="178"/>
        <source>(none: intrabeam at the exit is assumed)</source>
        <translation>(keiner: direkter Strahl am Austritt angenommen)</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::CautionStrip</name>
    <message>
        <location filename="../app/gui/widgets/cautionstrip.cpp" line="64"/>
        <source>Caution: an aid to your laser safety officer, not a substitute. Local rules take precedence.</source>
        <translation>Vorsicht: eine Hilfe für die Laserschutzbeauftragten, kein Ersatz. Örtliche Vorschriften haben Vorrang.</translation>
    </message>
    <message>
        <location filename="../app/gui/widgets/cautionstrip.cpp" line="67"/>
        <source>More</source>
        <translation>Mehr</translation>
    </message>
    <message>
        <location filename="../app/gui/widgets/cautionstrip.cpp" line="67"/>
        <source>Less</source>
        <translation>Weniger</translation>
    </message>
    <message>
        <location filename="../app/gui/widgets/cautionstrip.cpp" line="68"/>
        <source>Show the full caution</source>
        <translation>Ganzen Warnhinweis zeigen</translation>
    </message>
    <message>
        <location filename="../app/gui/widgets/cautionstrip.cpp" line="68"/>
        <source>Fold the caution to one line</source>
        <translation>Warnhinweis auf eine Zeile falten</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::ChartWidget</name>
    <message>
        <location filename="../app/gui/plots/chartwidget.cpp" line="478"/>
        <source>Chart exported from Beamwarden</source>
        <translation>Diagramm, exportiert aus Beamwarden</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::EyewearPanel</name>
    <message>
        <source>Item</source>
        <translation type="vanished">Schutzbrille</translation>
    </message>
    <message>
        <source>EN 207 / EN 208 markings</source>
        <translation type="vanished">EN 207 / EN 208</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="111"/>
        <source>Visible transmittance</source>
        <translation>Lichttransmission</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="112"/>
        <source>Count</source>
        <translation>Anzahl</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="113"/>
        <source>Location</source>
        <translation>Standort</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="77"/>
        <source>Add item</source>
        <translation>Brille hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="78"/>
        <source>Remove</source>
        <translation>Entfernen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="83"/>
        <source>one marked line each, e.g. 740-1100 D LB7 + IR LB8</source>
        <translation>je Zeile eine Kennzeichnung, z. B. 740-1100 D LB7 + IR LB8</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="86"/>
        <source>alignment eyewear, e.g. 1 W 2x10^-4 J 632-640 RB3</source>
        <translation>Laserjustierbrille, z. B. 1 W 2x10^-4 J 632-640 RB3</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="89"/>
        <source>one row each: FROM-TO OD in nm, e.g. 740-1100 &gt;=7</source>
        <translation>je Zeile: VON-BIS OD in nm, z. B. 740-1100 &gt;=7</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="96"/>
        <source>0 to 1, e.g. 0.35</source>
        <translation>0 bis 1, z. B. 0.35</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="101"/>
        <source>YYYY-MM-DD</source>
        <translation>JJJJ-MM-TT</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="103"/>
        <source>Selected item</source>
        <translation>Gewählte Schutzbrille</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="105"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="106"/>
        <source>Description</source>
        <translation>Beschreibung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="107"/>
        <source>EN 207 markings</source>
        <translation>Kennzeichnung EN 207</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="108"/>
        <source>EN 208 markings</source>
        <translation>Kennzeichnung EN 208</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="109"/>
        <source>Spectral OD</source>
        <translation>Spektrale OD</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="114"/>
        <source>Last inspection</source>
        <translation>Letzte Prüfung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="120"/>
        <source>Output / case</source>
        <translation>Ausgang / Fall</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="120"/>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="120"/>
        <source>Required OD</source>
        <translation>Benötigte OD</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="120"/>
        <source>Provided OD</source>
        <translation>Vorhandene OD</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="121"/>
        <source>Against the selected laser</source>
        <translation>Für den gewählten Laser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="154"/>
        <source>New eyewear %1</source>
        <translation>Neue Schutzbrille %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="174"/>
        <source>Last inspection: &apos;%1&apos; is not a date; expected YYYY-MM-DD</source>
        <translation>Letzte Prüfung: „%1“ ist kein Datum; erwartet wird JJJJ-MM-TT</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="178"/>
        <source>Edit %1</source>
        <translation>Bearbeiten: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="181"/>
        <source>eyewear name</source>
        <translation>Name der Schutzbrille</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="182"/>
        <source>description</source>
        <translation>Beschreibung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="183"/>
        <source>location</source>
        <translation>Standort</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="184"/>
        <source>inspection date</source>
        <translation>Prüfdatum</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="190"/>
        <source>Edit visible transmittance</source>
        <translation>Lichttransmission bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="199"/>
        <source>Edit count</source>
        <translation>Anzahl bearbeiten</translation>
    </message>
    <message>
        <source>not known</source>
        <translation type="vanished">unbekannt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="273"/>
        <source>OD table</source>
        <translation>OD-Tabelle</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="289"/>
        <source>Edit markings and OD table</source>
        <translation>Kennzeichnung und OD-Tabelle bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="297"/>
        <source>Select a laser and an item to check one against the other.</source>
        <translation>Wählen Sie einen Laser und eine Schutzbrille, um beide gegeneinander zu prüfen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="301"/>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="308"/>
        <source>covers</source>
        <translation>schützt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="302"/>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="309"/>
        <source>cannot tell</source>
        <translation>nicht prüfbar</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="303"/>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="310"/>
        <source>falls short</source>
        <translation>reicht nicht</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/eyewearpanel.cpp" line="304"/>
        <source>%1 against %2: %3</source>
        <translation>%1 für %2: %3</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::EyewearShelfModel</name>
    <message>
        <location filename="../app/gui/models/eyewearshelfmodel.cpp" line="58"/>
        <source>not known</source>
        <translation>unbekannt</translation>
    </message>
    <message>
        <location filename="../app/gui/models/eyewearshelfmodel.cpp" line="75"/>
        <source>Item</source>
        <translation>Schutzbrille</translation>
    </message>
    <message>
        <location filename="../app/gui/models/eyewearshelfmodel.cpp" line="77"/>
        <source>EN 207 / EN 208 markings</source>
        <translation>EN 207 / EN 208</translation>
    </message>
    <message>
        <location filename="../app/gui/models/eyewearshelfmodel.cpp" line="79"/>
        <source>Visible transmittance</source>
        <translation>Lichttransmission</translation>
    </message>
    <message>
        <location filename="../app/gui/models/eyewearshelfmodel.cpp" line="81"/>
        <source>Count</source>
        <translation>Anzahl</translation>
    </message>
    <message>
        <location filename="../app/gui/models/eyewearshelfmodel.cpp" line="83"/>
        <source>Location</source>
        <translation>Standort</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::HazardSheetPanel</name>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="40"/>
        <source>Paper:</source>
        <translation>Papier:</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="41"/>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="227"/>
        <source>A4</source>
        <translation>A4</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="42"/>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="227"/>
        <source>US Letter</source>
        <translation>US Letter</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="62"/>
        <source>Export PDF…</source>
        <translation>PDF exportieren…</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="64"/>
        <source>Write the hazard sheet as a PDF file</source>
        <translation>Das Gefährdungsblatt als PDF-Datei schreiben</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="66"/>
        <source>Print…</source>
        <translation>Drucken…</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="68"/>
        <source>Print the hazard sheet</source>
        <translation>Das Gefährdungsblatt drucken</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="102"/>
        <source>Select a laser to preview its hazard sheet.</source>
        <translation>Wählen Sie einen Laser, um sein Gefährdungsblatt anzuzeigen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="154"/>
        <source>No hazard sheet to export: select a laser first.</source>
        <translation>Kein Gefährdungsblatt zum Exportieren: Wählen Sie zuerst einen Laser.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="159"/>
        <source>Could not write %1: %2</source>
        <translation>%1 konnte nicht geschrieben werden: %2</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="175"/>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="180"/>
        <source>Print hazard sheet</source>
        <translation>Gefährdungsblatt drucken</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="180"/>
        <source>The printer could not be started.</source>
        <translation>Der Drucker konnte nicht gestartet werden.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="202"/>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="206"/>
        <source>Export hazard sheet</source>
        <translation>Gefährdungsblatt exportieren</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="202"/>
        <source>PDF files (*.pdf)</source>
        <translation>PDF-Dateien (*.pdf)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="227"/>
        <source>%1 page(s), %2</source>
        <translation>%1 Seite(n), %2</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/hazardsheetpanel.cpp" line="248"/>
        <source>Page %1 of %2</source>
        <translation>Seite %1 von %2</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::HistoryPanel</name>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="37"/>
        <source>draft</source>
        <translation>Entwurf</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="39"/>
        <source>in review</source>
        <translation>in Prüfung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="41"/>
        <source>approved</source>
        <translation>freigegeben</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="43"/>
        <source>withdrawn</source>
        <translation>zurückgezogen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="57"/>
        <source>Assessment</source>
        <translation>Bewertung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="57"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="57"/>
        <source>Author</source>
        <translation>Verfasser(in)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="57"/>
        <source>Created</source>
        <translation>Erstellt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="57"/>
        <source>Rule set</source>
        <translation>Regelwerk</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="57"/>
        <source>Program</source>
        <translation>Programm</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="59"/>
        <source>Record current results as a draft</source>
        <translation>Aktuelle Ergebnisse als Entwurf erfassen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="60"/>
        <source>Change status…</source>
        <translation>Status ändern…</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="99"/>
        <source>Select a laser to see its assessments.</source>
        <translation>Wählen Sie einen Laser, um seine Bewertungen zu sehen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="104"/>
        <source>%1 has no recorded assessment yet.</source>
        <translation>Für %1 ist noch keine Bewertung erfasst.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="105"/>
        <source>Assessments of %1</source>
        <translation>Bewertungen von %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="112"/>
        <source> — out of date: the laser changed after approval</source>
        <translation> — veraltet: Der Laser wurde nach der Freigabe geändert</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="122"/>
        <source>%1 → %2: %3</source>
        <translation>%1 → %2: %3</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="138"/>
        <source>Assessment of %1</source>
        <translation>Bewertung von %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="151"/>
        <source>Not recorded</source>
        <translation>Nicht erfasst</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="169"/>
        <source>Change the status of %1</source>
        <translation>Status von %1 ändern</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="177"/>
        <source>No change possible</source>
        <translation>Keine Änderung möglich</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="178"/>
        <source>A %1 assessment keeps its status.</source>
        <translation>Eine Bewertung im Status „%1“ behält ihren Status.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="185"/>
        <source>From</source>
        <translation>Von</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="186"/>
        <source>To</source>
        <translation>Nach</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="187"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="188"/>
        <source>Comment</source>
        <translation>Kommentar</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="195"/>
        <location filename="../app/gui/panels/historypanel.cpp" line="206"/>
        <source>Not signed</source>
        <translation>Nicht unterzeichnet</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/historypanel.cpp" line="195"/>
        <source>A sign-off needs the name of who signs.</source>
        <translation>Eine Freigabe braucht den Namen der Person, die unterzeichnet.</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::LasersPanel</name>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="43"/>
        <source>Add laser</source>
        <translation>Laser hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="44"/>
        <source>Remove</source>
        <translation>Entfernen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="60"/>
        <source>not known</source>
        <translation>unbekannt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="60"/>
        <source>Class %1</source>
        <translation>Klasse %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="63"/>
        <source>Laser</source>
        <translation>Laser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="65"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="66"/>
        <source>Maker and model</source>
        <translation>Hersteller und Modell</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="67"/>
        <source>Serial number</source>
        <translation>Seriennummer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="68"/>
        <source>Room</source>
        <translation>Raum</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="69"/>
        <source>Class</source>
        <translation>Klasse</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="70"/>
        <source>Notes</source>
        <translation>Notizen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="74"/>
        <location filename="../app/gui/panels/laserspanel.cpp" line="168"/>
        <source>Add output</source>
        <translation>Ausgang hinzufügen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="75"/>
        <location filename="../app/gui/panels/laserspanel.cpp" line="178"/>
        <source>Remove output</source>
        <translation>Ausgang entfernen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="76"/>
        <source>Outputs</source>
        <translation>Ausgänge</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="87"/>
        <source>Exposure cases of this output</source>
        <translation>Expositionsfälle dieses Ausgangs</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="133"/>
        <source>New laser %1</source>
        <translation>Neuer Laser %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="135"/>
        <source>main output</source>
        <translation>Hauptausgang</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="148"/>
        <source>laser name</source>
        <translation>Lasername</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="149"/>
        <source>maker and model</source>
        <translation>Hersteller und Modell</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="150"/>
        <source>serial number</source>
        <translation>Seriennummer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="151"/>
        <source>room</source>
        <translation>Raum</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="152"/>
        <source>class</source>
        <translation>Klasse</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="156"/>
        <source>notes</source>
        <translation>Notizen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="166"/>
        <source>output %1</source>
        <translation>Ausgang %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="189"/>
        <location filename="../app/gui/panels/laserspanel.cpp" line="200"/>
        <location filename="../app/gui/panels/laserspanel.cpp" line="317"/>
        <source>Edit %1</source>
        <translation>Bearbeiten: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/laserspanel.cpp" line="241"/>
        <source>(no room)</source>
        <translation>(kein Raum)</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::LimitCurvesPanel</name>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="37"/>
        <source>%1 to %2</source>
        <translation>%1 bis %2</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="41"/>
        <source>%1, %2 pulses of %3 at %4</source>
        <translation>%1, Impulse von %2 mit %3 bei %4</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="44"/>
        <source>%1, continuous, %2</source>
        <translation>%1, Dauerstrich, %2</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="67"/>
        <source>All three</source>
        <translation>Alle drei</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="67"/>
        <source>MPE</source>
        <translation>MZB</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="67"/>
        <source>Optical density</source>
        <translation>Optische Dichte</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="67"/>
        <source>Distance</source>
        <translation>Abstand</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="68"/>
        <source>Show the three charts together</source>
        <translation>Die drei Diagramme zusammen zeigen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="68"/>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="148"/>
        <source>MPE against exposure duration</source>
        <translation>MZB über der Expositionsdauer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="69"/>
        <source>Required and available optical density against wavelength</source>
        <translation>Erforderliche und vorhandene optische Dichte über der Wellenlänge</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="70"/>
        <source>Exposure against distance, with the NOHD</source>
        <translation>Exposition über dem Abstand, mit NOHD</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="89"/>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="244"/>
        <source>Export chart</source>
        <translation>Exportieren</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="90"/>
        <source>Save a chart as a PNG image or an SVG drawing</source>
        <translation>Ein Diagramm als PNG-Bild oder SVG-Zeichnung speichern</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="94"/>
        <source>%1…</source>
        <translation>%1…</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="150"/>
        <source>Optical density against wavelength</source>
        <translation>Optische Dichte über der Wellenlänge</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="152"/>
        <source>Exposure against distance</source>
        <translation>Exposition über dem Abstand</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="161"/>
        <source>Select a laser output to plot its limit curves.</source>
        <translation>Wählen Sie einen Laserausgang, um seine Grenzwertkurven zu zeichnen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="169"/>
        <source>No output selected</source>
        <translation>Kein Ausgang gewählt</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="183"/>
        <source>This laser has no output number %1 to plot.</source>
        <translation>Dieser Laser hat keinen Ausgang Nr. %1 zum Zeichnen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="188"/>
        <source>This output has no exposure case number %1 to plot.</source>
        <translation>Dieser Ausgang hat keinen Expositionsfall Nr. %1 zum Zeichnen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="193"/>
        <source>This exposure case has no wavelength to plot.</source>
        <translation>Dieser Expositionsfall hat keine Wellenlänge zum Zeichnen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="202"/>
        <source>%1 — %2, %3</source>
        <translation>%1 — %2, %3</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="239"/>
        <source>Export %1</source>
        <translation>%1 exportieren</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="240"/>
        <source>PNG image (*.png);;SVG drawing (*.svg)</source>
        <translation>PNG-Bild (*.png);;SVG-Zeichnung (*.svg)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/limitcurvespanel.cpp" line="245"/>
        <source>The chart could not be written to %1. Use a name ending in .png or .svg in a folder you can write to.</source>
        <translation>Das Diagramm konnte nicht nach %1 geschrieben werden. Verwenden Sie einen Namen auf .png oder .svg in einem Ordner, in den Sie schreiben dürfen.</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::MainWindow</name>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="210"/>
        <source>%1 — Beamwarden</source>
        <translation>%1 — Beamwarden</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="211"/>
        <source>Lab file: %1</source>
        <translation>Labordatei: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="186"/>
        <source>No lab open</source>
        <translation>Kein Labor geöffnet</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="88"/>
        <source>Output:</source>
        <translation>Ausgang:</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="90"/>
        <source>Exposure case:</source>
        <translation>Expositionsfall:</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="150"/>
        <source>Laser:</source>
        <translation>Laser:</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="186"/>
        <source>no file</source>
        <translation>keine Datei</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="228"/>
        <source>Not opened: %1</source>
        <translation>Nicht geöffnet: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="277"/>
        <source>Not stored: %1</source>
        <translation>Nicht gespeichert: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="375"/>
        <source>&amp;File</source>
        <translation>&amp;Datei</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="376"/>
        <source>&amp;New lab…</source>
        <translation>&amp;Neues Labor…</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="377"/>
        <source>&amp;Open…</source>
        <translation>Ö&amp;ffnen…</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="379"/>
        <source>Open &amp;demo lab</source>
        <translation>&amp;Demo-Labor öffnen</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="381"/>
        <source>Demo lab</source>
        <translation>Demo-Labor</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="383"/>
        <source>Open &amp;recent</source>
        <translation>&amp;Zuletzt geöffnet</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="386"/>
        <source>&amp;Import lab export…</source>
        <translation>Labor-Export &amp;importieren…</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="387"/>
        <source>&amp;Export lab…</source>
        <translation>Labor &amp;exportieren…</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="388"/>
        <source>Import eyewear &amp;CSV…</source>
        <translation>Schutzbrillen aus &amp;CSV importieren…</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="389"/>
        <source>&amp;Backup…</source>
        <translation>&amp;Sicherungskopie…</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="391"/>
        <source>&amp;Quit</source>
        <translation>&amp;Beenden</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="394"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bearbeiten</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="395"/>
        <source>&amp;Undo</source>
        <translation>&amp;Rückgängig</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="400"/>
        <source>&amp;Redo</source>
        <translation>&amp;Wiederholen</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="406"/>
        <source>&amp;View</source>
        <translation>&amp;Ansicht</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="413"/>
        <source>&amp;Settings</source>
        <translation>&amp;Einstellungen</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="414"/>
        <source>Rule set</source>
        <translation>Regelwerk</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="417"/>
        <source>Strictest of IEC 60825-1:2014 and :2007 (default)</source>
        <translation>Strengster Wert aus IEC 60825-1:2014 und :2007 (Standard)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="418"/>
        <source>IEC 60825-1:2014 only</source>
        <translation>Nur IEC 60825-1:2014</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="419"/>
        <source>IEC 60825-1:2007 only (EU workplace basis)</source>
        <translation>Nur IEC 60825-1:2007 (Basis des EU-Arbeitsschutzes)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="431"/>
        <source>2014 repeated-pulse factor C5</source>
        <translation>Pulsfolgefaktor C5 (2014)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="434"/>
        <source>Conservative, N^-0.25 (default)</source>
        <translation>Konservativ, N^-0.25 (Standard)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="435"/>
        <source>Candidate edition reading (reconstructed)</source>
        <translation>Mögliche Lesart der Ausgabe (rekonstruiert)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="447"/>
        <source>Language</source>
        <translation>Sprache</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="449"/>
        <source>System default</source>
        <translation>Systemvorgabe</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="453"/>
        <source>The language changes at the next start.</source>
        <translation>Die Sprache wechselt beim nächsten Start.</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="456"/>
        <source>&amp;Help</source>
        <translation>&amp;Hilfe</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="457"/>
        <source>&amp;About Beamwarden</source>
        <translation>&amp;Über Beamwarden</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="477"/>
        <source>Rule set: IEC 60825-1:2014</source>
        <translation>Regelwerk: IEC 60825-1:2014</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="480"/>
        <source>Rule set: IEC 60825-1:2007</source>
        <translation>Regelwerk: IEC 60825-1:2007</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="484"/>
        <source> (C5: edition reading)</source>
        <translation> (C5: Lesart der Ausgabe)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="491"/>
        <source>Open lab file</source>
        <translation>Labordatei öffnen</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="491"/>
        <source>Lab files (*.bwlab);;All files (*)</source>
        <translation>Labordateien (*.bwlab);;Alle Dateien (*)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="498"/>
        <source>New lab file</source>
        <translation>Neue Labordatei</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="498"/>
        <location filename="../app/gui/mainwindow.cpp" line="518"/>
        <location filename="../app/gui/mainwindow.cpp" line="569"/>
        <source>Lab files (*.bwlab)</source>
        <translation>Labordateien (*.bwlab)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="505"/>
        <source>New lab</source>
        <translation>Neues Labor</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="514"/>
        <source>Import lab export</source>
        <translation>Labor-Export importieren</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="514"/>
        <source>Lab exports (*.bwlab.json *.json)</source>
        <translation>Labor-Exporte (*.bwlab.json *.json)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="518"/>
        <source>New lab file for the import</source>
        <translation>Neue Labordatei für den Import</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="523"/>
        <source>Import</source>
        <translation>Import</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="523"/>
        <location filename="../app/gui/mainwindow.cpp" line="555"/>
        <source>Nothing was imported: %1</source>
        <translation>Nichts wurde importiert: %1</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="534"/>
        <source>Export lab</source>
        <translation>Labor exportieren</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="534"/>
        <source>Lab exports (*.bwlab.json)</source>
        <translation>Labor-Exporte (*.bwlab.json)</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="538"/>
        <source>Export</source>
        <translation>Export</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="540"/>
        <source>Exported to %1</source>
        <translation>Exportiert nach %1</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="547"/>
        <location filename="../app/gui/mainwindow.cpp" line="554"/>
        <source>Import eyewear inventory</source>
        <translation>Schutzbrillenbestand importieren</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="548"/>
        <source>CSV files (*.csv);;All files (*)</source>
        <translation>CSV-Dateien (*.csv);;Alle Dateien (*)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/gui/mainwindow.cpp" line="561"/>
        <source>Imported %n eyewear item(s).</source>
        <translation>
            <numerusform>%n Schutzbrille importiert.</numerusform>
            <numerusform>%n Schutzbrillen importiert.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="569"/>
        <source>Back up lab file</source>
        <translation>Labordatei sichern</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="573"/>
        <source>Backup</source>
        <translation>Sicherungskopie</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="575"/>
        <source>Backed up to %1</source>
        <translation>Gesichert nach %1</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="590"/>
        <source>About Beamwarden</source>
        <translation>Über Beamwarden</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="591"/>
        <source>&lt;h3&gt;Beamwarden %1&lt;/h3&gt;&lt;p&gt;Exposure limits, hazard distances and eyewear checks for laser labs.&lt;/p&gt;&lt;p&gt;%2&lt;/p&gt;</source>
        <translation>&lt;h3&gt;Beamwarden %1&lt;/h3&gt;&lt;p&gt;Expositionsgrenzwerte, Gefährdungsabstände und Prüfung von Laserschutzbrillen für Laserlabore.&lt;/p&gt;&lt;p&gt;%2&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/gui/mainwindow.cpp" line="474"/>
        <source>Rule set: strictest of IEC 60825-1:2014 and IEC 60825-1:2007</source>
        <translation>Regelwerk: strengster Wert aus IEC 60825-1:2014 und IEC 60825-1:2007</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::OutputEditor</name>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="57"/>
        <source>e.g. 800 nm</source>
        <translation>z. B. 800 nm</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="60"/>
        <source>FWHM of a band, e.g. 27 nm; empty for a line</source>
        <translation>Halbwertsbreite eines Bands, z. B. 27 nm; leer für eine Linie</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="61"/>
        <source>CW</source>
        <translation>Dauerstrich</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="62"/>
        <source>Pulsed</source>
        <translation>Gepulst</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="71"/>
        <source>CW or mean power, e.g. 4 W</source>
        <translation>Dauer- oder mittlere Leistung, z. B. 4 W</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="75"/>
        <source>per pulse, e.g. 4 mJ</source>
        <translation>je Impuls, z. B. 4 mJ</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="77"/>
        <source>e.g. 35 fs</source>
        <translation>z. B. 35 fs</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="79"/>
        <source>e.g. 1 kHz</source>
        <translation>z. B. 1 kHz</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="82"/>
        <source>no bursts</source>
        <translation>keine Pulsgruppen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="85"/>
        <source>rate of the bursts</source>
        <translation>Takt der Gruppen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="87"/>
        <source>at the exit, e.g. 10 mm</source>
        <translation>am Austritt, z. B. 10 mm</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="89"/>
        <source>1/e (63 %)</source>
        <translation>1/e (63 %)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="90"/>
        <source>1/e² (86 %)</source>
        <translation>1/e² (86 %)</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="92"/>
        <source>full angle, e.g. 0.5 mrad</source>
        <translation>voller Winkel, z. B. 0.5 mrad</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="94"/>
        <source>not declared</source>
        <translation>nicht angegeben</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="94"/>
        <source>Gaussian</source>
        <translation>gaußförmig</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="94"/>
        <source>flat-top</source>
        <translation>Flat-Top</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="105"/>
        <source>Emission</source>
        <translation>Emission</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="107"/>
        <source>Wavelength</source>
        <translation>Wellenlänge</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="108"/>
        <source>Bandwidth</source>
        <translation>Bandbreite</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="109"/>
        <source>Time structure</source>
        <translation>Zeitverhalten</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="110"/>
        <source>Power</source>
        <translation>Leistung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="111"/>
        <source>Pulse energy</source>
        <translation>Impulsenergie</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="112"/>
        <source>Pulse duration</source>
        <translation>Impulsdauer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="113"/>
        <source>Repetition rate</source>
        <translation>Pulswiederholfrequenz</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="114"/>
        <source>Pulses per burst</source>
        <translation>Impulse je Pulsgruppe</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="115"/>
        <source>Burst rate</source>
        <translation>Pulsgruppenfrequenz</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="118"/>
        <source>Beam</source>
        <translation>Strahl</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="120"/>
        <source>Diameter</source>
        <translation>Durchmesser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="121"/>
        <source>Divergence</source>
        <translation>Divergenz</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="122"/>
        <source>Given at</source>
        <translation>Angegeben bei</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="123"/>
        <source>Profile</source>
        <translation>Profil</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="126"/>
        <source>Output name</source>
        <translation>Name des Ausgangs</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="138"/>
        <source>output name</source>
        <translation>Name des Ausgangs</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="151"/>
        <source>wavelength</source>
        <translation>Wellenlänge</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="163"/>
        <source>bandwidth</source>
        <translation>Bandbreite</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="170"/>
        <source>time structure</source>
        <translation>Zeitverhalten</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="180"/>
        <source>power</source>
        <translation>Leistung</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="182"/>
        <source>pulse energy</source>
        <translation>Impulsenergie</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="186"/>
        <source>pulse duration</source>
        <translation>Impulsdauer</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="188"/>
        <source>repetition rate</source>
        <translation>Pulswiederholfrequenz</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="190"/>
        <source>beam diameter</source>
        <translation>Strahldurchmesser</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="193"/>
        <source>divergence</source>
        <translation>Divergenz</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="204"/>
        <source>bursts</source>
        <translation>Pulsgruppen</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="211"/>
        <source>beam definition</source>
        <translation>Strahldefinition</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/outputeditor.cpp" line="215"/>
        <source>beam profile</source>
        <translation>Strahlprofil</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::PanelPage</name>
    <message>
        <location filename="../app/gui/panels/panelpage.cpp" line="17"/>
        <source>No lasers in this lab yet.</source>
        <translation>Noch keine Laser in diesem Labor.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panelpage.cpp" line="19"/>
        <source>No eyewear on the shelf yet.</source>
        <translation>Noch keine Schutzbrillen im Bestand.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panelpage.cpp" line="21"/>
        <source>Select a laser to see its assessment.</source>
        <translation>Wählen Sie einen Laser, um seine Bewertung zu sehen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panelpage.cpp" line="23"/>
        <source>Select a laser to plot its limit curves.</source>
        <translation>Wählen Sie einen Laser, um seine Grenzwertkurven zu zeichnen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panelpage.cpp" line="25"/>
        <source>Select a laser to preview its hazard sheet.</source>
        <translation>Wählen Sie einen Laser, um sein Gefährdungsblatt anzuzeigen.</translation>
    </message>
    <message>
        <location filename="../app/gui/panels/panelpage.cpp" line="27"/>
        <source>No assessments recorded yet.</source>
        <translation>Noch keine Bewertungen erfasst.</translation>
    </message>
</context>
<context>
    <name>beamwarden::gui::QuantityField</name>
    <message>
        <location filename="../app/gui/widgets/quantityfield.cpp" line="82"/>
        <source>a value is needed here</source>
        <translation>hier wird ein Wert benötigt</translation>
    </message>
    <message>
        <location filename="../app/gui/widgets/quantityfield.cpp" line="106"/>
        <source>not accepted</source>
        <translation>nicht angenommen</translation>
    </message>
</context>
<context>
    <name>beamwarden::sheet::Sheet</name>
    <message>
        <location filename="../app/sheet/odplot.cpp" line="62"/>
        <source>required OD, per band (diamond)</source>
        <translation>erforderliche OD je Band (Raute)</translation>
    </message>
    <message>
        <location filename="../app/sheet/odplot.cpp" line="65"/>
        <source>%1 (solid line)</source>
        <translation>%1 (durchgezogene Linie)</translation>
    </message>
    <message>
        <location filename="../app/sheet/odplot.cpp" line="65"/>
        <source>%1 (dashed line)</source>
        <translation>%1 (gestrichelte Linie)</translation>
    </message>
    <message>
        <location filename="../app/sheet/odplot.cpp" line="68"/>
        <source>no eyewear to compare</source>
        <translation>keine Schutzbrille zum Vergleich</translation>
    </message>
    <message>
        <location filename="../app/sheet/odplot.cpp" line="148"/>
        <source>wavelength (µm, log scale)</source>
        <translation>Wellenlänge (µm, logarithmisch)</translation>
    </message>
    <message>
        <location filename="../app/sheet/odplot.cpp" line="148"/>
        <source>wavelength (nm, log scale)</source>
        <translation>Wellenlänge (nm, logarithmisch)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="43"/>
        <source>within limit</source>
        <translation>unter dem Grenzwert</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="56"/>
        <source>over limit %1</source>
        <translation>über dem Grenzwert %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="251"/>
        <location filename="../app/sheet/sheetformat.cpp" line="63"/>
        <location filename="../app/sheet/sheetformat.cpp" line="85"/>
        <source>none</source>
        <translation>entfällt</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="87"/>
        <source>unbounded</source>
        <translation>unbegrenzt</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="109"/>
        <source>covers</source>
        <translation>schützt</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="111"/>
        <source>cannot tell</source>
        <translation>nicht beurteilbar</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="113"/>
        <source>falls short</source>
        <translation>reicht nicht</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="122"/>
        <source>draft</source>
        <translation>Entwurf</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="124"/>
        <source>in review</source>
        <translation>in Prüfung</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="126"/>
        <source>approved</source>
        <translation>freigegeben</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="128"/>
        <source>withdrawn</source>
        <translation>zurückgezogen</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="136"/>
        <source>class not recorded</source>
        <translation>Klasse nicht erfasst</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="137"/>
        <source>Class %1</source>
        <translation>Klasse %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="144"/>
        <source>intrabeam</source>
        <translation>direkter Strahl</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="146"/>
        <source>through a lens</source>
        <translation>durch eine Linse</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="148"/>
        <source>from a fibre end</source>
        <translation>aus einem Faserende</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="150"/>
        <source>diffuse reflection</source>
        <translation>diffuse Reflexion</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="152"/>
        <source>specular reflection</source>
        <translation>gerichtete Reflexion</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="154"/>
        <source>through magnifying optics</source>
        <translation>durch vergrößernde Optik</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="163"/>
        <source>rule 1, single pulse</source>
        <translation>Regel 1, Einzelimpuls</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="165"/>
        <source>rule 2, average power</source>
        <translation>Regel 2, mittlere Leistung</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetformat.cpp" line="167"/>
        <source>rule 3, pulse train</source>
        <translation>Regel 3, Impulsfolge</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetlayout.cpp" line="33"/>
        <source>HAZARD SHEET</source>
        <translation>GEFÄHRDUNGSBLATT</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetlayout.cpp" line="56"/>
        <source>%1 hazard sheet (continued)</source>
        <translation>Gefährdungsblatt %1 (Fortsetzung)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetlayout.cpp" line="233"/>
        <source>Page %1 of %2</source>
        <translation>Seite %1 von %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="244"/>
        <location filename="../app/sheet/sheetmodel.cpp" line="88"/>
        <location filename="../app/sheet/sheetmodel.cpp" line="233"/>
        <source>%1 to %2</source>
        <translation>%1 bis %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="91"/>
        <source>%1 (band %2)</source>
        <translation>%1 (Band %2)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="97"/>
        <source>CW, %1</source>
        <translation>Dauerstrich, %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="99"/>
        <source>%1 pulses at %2, %3 per pulse (%4 mean)</source>
        <translation>Impulse von %1 mit %2, %3 je Impuls (%4 im Mittel)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="103"/>
        <source>in bursts of %1 at %2</source>
        <translation>in Gruppen zu %1 mit %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="114"/>
        <source>beam %1 (%2), divergence %3</source>
        <translation>Strahl %1 (%2), Divergenz %3</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="117"/>
        <source>Gaussian</source>
        <translation>gaußförmig</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="119"/>
        <source>flat-top</source>
        <translation>Flat-Top</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="129"/>
        <source>at the exit</source>
        <translation>am Austritt</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="130"/>
        <source>at %1</source>
        <translation>in %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="132"/>
        <source>%1 exposure</source>
        <translation>%1 Exposition</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="134"/>
        <source>%1 per pulse</source>
        <translation>%1 je Impuls</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="142"/>
        <source>both editions</source>
        <translation>beide Ausgaben</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="155"/>
        <source>hazard radius</source>
        <translation>Gefährdungs­radius</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="157"/>
        <source>does not end within the model</source>
        <translation>endet nicht innerhalb des Modells</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="134"/>
        <source>OD margin %1</source>
        <translation>OD-Reserve %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="236"/>
        <source>Eyewear OD</source>
        <translation>OD der Schutzbrille</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="237"/>
        <source>OD of %1</source>
        <translation>OD von %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="267"/>
        <source>not rated here</source>
        <translation>hier nicht ausgewiesen</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="270"/>
        <source>%1, enough</source>
        <translation>%1, ausreichend</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="273"/>
        <source>%1, short by %2</source>
        <translation>%1, es fehlen %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="303"/>
        <source>best on the shelf; it does not cover every output</source>
        <translation>die beste im Bestand; sie schützt nicht vor jedem Ausgang</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="315"/>
        <source>No eyewear on the shelf: nothing has been checked against this laser.</source>
        <translation>Keine Schutzbrillen im Bestand: Nichts wurde gegen diesen Laser geprüft.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="317"/>
        <source>Wear %1: it covers every output.</source>
        <translation>Tragen Sie %1: Sie schützt vor jedem Ausgang.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="323"/>
        <source>Also covering: %1.</source>
        <translation>Ebenfalls ausreichend: %1.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="326"/>
        <source>No single item covers every output. Wear %1 for %2, and %3 for %4.</source>
        <translation>Keine einzelne Schutzbrille schützt vor jedem Ausgang. Tragen Sie %1 für %2 und %3 für %4.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheeteyewearmodel.cpp" line="330"/>
        <source>Nothing on the shelf covers every output.</source>
        <translation>Keine Schutzbrille im Bestand schützt vor jedem Ausgang.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="200"/>
        <source>No assessment of this laser is on record: the figures on this sheet are computed from the current inputs and have not been reviewed.</source>
        <translation>Für diesen Laser ist keine Bewertung erfasst: Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet und wurden nicht geprüft.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="205"/>
        <source>Assessment %1</source>
        <translation>Bewertung %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="206"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="209"/>
        <source>by %1</source>
        <translation>von %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="211"/>
        <source>created %1</source>
        <translation>erstellt %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="213"/>
        <source>last changed %1</source>
        <translation>zuletzt geändert %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="215"/>
        <source>computed by Beamwarden %1</source>
        <translation>berechnet mit Beamwarden %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="219"/>
        <source>Out of date: the laser changed after this assessment, so its figures no longer describe it. The figures on this sheet are computed from the current inputs.</source>
        <translation>Veraltet: Der Laser wurde nach dieser Bewertung geändert, ihre Werte beschreiben ihn nicht mehr. Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="225"/>
        <source>Not approved yet: the figures on this sheet are computed from the current inputs.</source>
        <translation>Noch nicht freigegeben: Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="229"/>
        <source>Earlier assessments on record: %1.</source>
        <translation>Frühere erfasste Bewertungen: %1.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="255"/>
        <source>%1 hazard sheet</source>
        <translation>Gefährdungsblatt %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="257"/>
        <source>Room not recorded</source>
        <translation>Raum nicht erfasst</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="259"/>
        <source>Room %1</source>
        <translation>Raum %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="267"/>
        <source>Laser safety officer: %1</source>
        <translation>Laserschutzbeauftragte(r): %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="267"/>
        <source>not recorded</source>
        <translation>nicht erfasst</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="270"/>
        <source>serial %1</source>
        <translation>Seriennummer %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="274"/>
        <source>Limits: the stricter of %1 and %2, figure by figure</source>
        <translation>Grenzwerte: für jeden Wert der strengere aus %1 und %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="276"/>
        <source>Limits: %1</source>
        <translation>Grenzwerte: %1</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="279"/>
        <source>2014 repeated-pulse factor C5: conservative reading</source>
        <translation>Impulsfolgefaktor C5 (2014): konservative Lesart</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="280"/>
        <source>2014 repeated-pulse factor C5: edition reading</source>
        <translation>Impulsfolgefaktor C5 (2014): Lesart der Ausgabe</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="282"/>
        <source>Computed by Beamwarden %1 on %2.</source>
        <translation>Berechnet mit Beamwarden %1 am %2.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="284"/>
        <source>Caution: the full caution is on page 1. These figures support, and never replace, the judgement of your laser safety officer.</source>
        <translation>Vorsicht: Der vollständige Hinweis steht auf Seite 1. Diese Werte unterstützen das Urteil Ihrer oder Ihres Laserschutzbeauftragten und ersetzen es nie.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="286"/>
        <source>Beamwarden %1, %2</source>
        <translation>Beamwarden %1, %2</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="135"/>
        <source>Outputs and exposure cases</source>
        <translation>Ausgänge und Expositionsfälle</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="138"/>
        <source>Exposure case</source>
        <translation>Expositionsfall</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="139"/>
        <source>MPE (governing rule)</source>
        <translation>MZB (maßgebliche Regel)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="140"/>
        <source>Eye</source>
        <translation>Auge</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="141"/>
        <source>Skin</source>
        <translation>Haut</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="142"/>
        <source>NOHD</source>
        <translation>NOHD</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="143"/>
        <location filename="../app/sheet/sheetsections.cpp" line="199"/>
        <source>Required OD</source>
        <translation>Erforder­liche OD</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="144"/>
        <source>Outputs and exposure cases (continued)</source>
        <translation>Ausgänge und Expositionsfälle (Fortsetzung)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="171"/>
        <source>Eye, skin: exposure at the worst point against the MPE. NOHD: beyond it the eye stays below the MPE. OD: rounded up, never down.</source>
        <translation>Auge, Haut: Exposition am ungünstigsten Punkt im Vergleich zur MZB. NOHD: jenseits davon bleibt das Auge unter der MZB. OD: aufgerundet, nie abgerundet.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="179"/>
        <source>Eyewear</source>
        <translation>Schutzbrillen</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="187"/>
        <source>A purchase must be marked at least (and reach the required OD below):</source>
        <translation>Eine Neuanschaffung braucht mindestens diese Kennzeichnung (und die erforderliche OD unten):</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="198"/>
        <source>Wavelength (output)</source>
        <translation>Wellenlänge (Ausgang)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="213"/>
        <source>† rests on a reconstructed limit row: see the footnote under the outputs.</source>
        <translation>† beruht auf einer rekonstruierten Grenzwertzeile: siehe Fußnote unter den Ausgängen.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="216"/>
        <source>Required OD and eyewear OD</source>
        <translation>Erforderliche OD und OD der Schutzbrille</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="241"/>
        <source>Eyewear on the shelf</source>
        <translation>Schutzbrillen im Bestand</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="242"/>
        <source>Verdict</source>
        <translation>Urteil</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="243"/>
        <source>Why (first reason)</source>
        <translation>Warum (erster Grund)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="244"/>
        <source>Eyewear on the shelf (continued)</source>
        <translation>Schutzbrillen im Bestand (Fortsetzung)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="249"/>
        <source>shown in the plot</source>
        <translation>im Diagramm gezeigt</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="266"/>
        <source>† Rests on a limit row reconstructed from public material, not read from the standard&apos;s text: verify the figure against the standard before relying on it.</source>
        <translation>† Beruht auf einer Grenzwertzeile, die aus öffentlichem Material rekonstruiert und nicht dem Text der Norm entnommen ist: Prüfen Sie den Wert an der Norm, bevor Sie sich darauf stützen.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="278"/>
        <source>Assessment record and signatures</source>
        <translation>Bewertung und Unterschriften</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="291"/>
        <source>When</source>
        <translation>Wann</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="292"/>
        <source>Who</source>
        <translation>Wer</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="293"/>
        <source>Status change</source>
        <translation>Statuswechsel</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="294"/>
        <source>Comment</source>
        <translation>Kommentar</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="295"/>
        <source>Sign-off history (continued)</source>
        <translation>Freigabeverlauf (Fortsetzung)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="308"/>
        <source>Role</source>
        <translation>Rolle</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="309"/>
        <source>Name</source>
        <translation>Name</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="310"/>
        <source>Date</source>
        <translation>Datum</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="311"/>
        <source>Signature</source>
        <translation>Unterschrift</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="312"/>
        <source>Laser safety officer</source>
        <translation>Laserschutzbeauftragte(r)</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="312"/>
        <source>Responsible for the laser</source>
        <translation>Verantwortlich für den Laser</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="313"/>
        <source>User, briefed on this sheet</source>
        <translation>Nutzer(in), anhand dieses Blatts unterwiesen</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetmodel.cpp" line="222"/>
        <source>Withdrawn: this assessment no longer stands. The figures on this sheet are computed from the current inputs.</source>
        <translation>Zurückgezogen: Diese Bewertung gilt nicht mehr. Die Werte auf diesem Blatt sind aus den aktuellen Eingaben berechnet.</translation>
    </message>
    <message>
        <location filename="../app/sheet/sheetsections.cpp" line="305"/>
        <source>Signatures</source>
        <translation>Unterschriften</translation>
    </message>
</context>
</TS>
