#pragma once
// Everything the sheet prints, as translated text and plot data, built once from the content. The layout only
// measures and paints this; no figure is computed here that the assessment did not already hold.
#include "beamwarden/eyewear/protection.hpp"
#include "sheetcontent.hpp"

#include <QPointF>
#include <QString>
#include <QStringList>

#include <limits>
#include <vector>

namespace beamwarden::sheet {

// A figure and whether it rests on a limit row reconstructed from public material (printed with a mark).
struct Figure {
    QString text;
    bool reconstructed = false;
};

struct CaseRow {
    QString name;
    QString detail; // how: viewing, where, for how long
    Figure mpe;
    QString mpeRule; // rule set, pulse rule and the row's formula
    Figure eyeVerdict;
    bool eyeOver = false;
    Figure skinVerdict;
    bool skinOver = false;
    Figure nohd;
    QString nohdDetail;
    Figure od;
};

struct OutputRows {
    QString name;
    QString light;  // wavelengths
    QString timing; // CW power, or pulse duration, rate, energy and mean power
    QString beam;
    std::vector<CaseRow> cases;
};

struct BandRow {
    double from_nm = 0;
    double to_nm = 0;
    double requiredOd = 0; // rounded up, as printed
    QString band;
    QString outputs;
    Figure required;
    QString provided; // by the chosen eyewear
    bool providedShort = false;
};

struct ShelfRow {
    QString name;
    eyewear::Verdict verdict = eyewear::Verdict::Covers;
    QString verdictText;
    QString reason; // the first reason, or the margin when it covers
    bool chosen = false;
};

struct PlotCurve {
    QString label;
    std::vector<QPointF> points; // (wavelength in nm, OD); a NaN OD breaks the line where the item is not rated
};

struct PlotBand {
    double from_nm = 0;
    double to_nm = 0;
    double od = 0;
};

struct PlotData {
    double from_nm = 0;
    double to_nm = 0;
    std::vector<PlotBand> required;
    std::vector<PlotCurve> eyewear; // the chosen item (or pair), or the best on the shelf
    QString eyewearNote;            // e.g. "best on the shelf, does not cover"
};

struct SignOffRow {
    QString when;
    QString who;
    QString change;
    QString comment;
};

struct SheetModel {
    QString laserName;
    QString documentTitle; // "<laser> hazard sheet", the PDF title
    QString labName;
    QString roomLine;
    QString lsoLine;
    QString laserClass; // "Class 4", or that it is not recorded
    QString laserLine;  // class, maker/model, serial
    QString basisLine;  // rule sets, C5 option, program version, date
    QString caution;
    QString shortCaution; // continuation pages: the caution in one line
    QString footerLeft;

    std::vector<OutputRows> outputs;

    QString eyewearSummary;
    QStringList purchaseMarkings;
    QString providedHeader;
    std::vector<BandRow> bands;
    std::vector<ShelfRow> shelf;
    PlotData plot;

    QStringList notes;
    bool anyReconstructed = false;

    QString recordSummary;
    QStringList recordLines;
    QString recordWarning; // the stored assessment no longer describes the laser, or is not approved
    std::vector<SignOffRow> signOffs;
    QString lsoName;
};

[[nodiscard]] SheetModel buildSheetModel(const SheetContent& content);

// Shared by the model's source files.
class SheetFormat;
// Whether a line of `eye` inside [from, to] nm rests on a reconstructed limit row.
[[nodiscard]] bool anyLineReconstructed(const hazard::HazardResult& eye, double from_nm = 0.0,
                                        double to_nm = std::numeric_limits<double>::infinity());
// Fills the eyewear fields of `model` (sheeteyewearmodel.cpp).
void addEyewearModel(SheetModel& model, const SheetContent& content, const SheetFormat& format);

} // namespace beamwarden::sheet
