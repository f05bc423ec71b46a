#include "sheetmodel.hpp"

#include "beamwarden/limits/ruleset.hpp"
#include "sheetformat.hpp"
#include "sheettr.hpp"

#include <QDate>

#include <algorithm>
#include <cmath>
#include <limits>
#include <map>
#include <optional>
#include <regex>
#include <set>
#include <tuple>
#include <utility>

namespace beamwarden::sheet {

namespace {

const limits::LimitRow* governingRow(const limits::MpeResult& result)
{
    if (result.setCount == 0)
        return nullptr;
    const limits::SetOutcome& set = result.governing();
    if (set.train) {
        switch (set.train->governingRule) {
        case limits::PulseRule::SinglePulse:
            return set.train->singlePulse.basis.row;
        case limits::PulseRule::AveragePower:
            return set.train->average.basis.row;
        case limits::PulseRule::PulseTrain:
            return set.train->repeated.basis.row;
        }
    }
    return set.single.count > 0 ? set.single.governingTerm().row : nullptr;
}

bool restsOnReconstructed(const limits::MpeResult& result)
{
    return result.setCount > 0 && result.restsOnReconstructedRow();
}

// The row's formula as printed for a person, with the area units written as on paper.
QString formulaText(std::string_view formula)
{
    QString text = fromUtf8(formula);
    text.replace(QStringLiteral("m^2"), QStringLiteral("m\u00b2"));
    text.replace(QStringLiteral("gamma_ph"), QStringLiteral("\u03b3_ph"));
    return text;
}

QString joined(const QStringList& parts, const QString& separator)
{
    QStringList kept;
    for (const QString& p : parts) {
        if (!p.isEmpty())
            kept.push_back(p);
    }
    return kept.join(separator);
}

const QString kDot = QStringLiteral(" \u00b7 ");

QString lightText(const model::Spectrum& spectrum, const SheetFormat& f)
{
    if (spectrum.samples.empty())
        return {};
    if (spectrum.isSingleLine())
        return f.quantity(spectrum.samples.front().wavelength);
    const bool lines = std::all_of(spectrum.samples.begin(), spectrum.samples.end(),
                                   [](const model::SpectralSample& s) { return s.width.si() <= 0.0; });
    if (lines) {
        QStringList each;
        for (const model::SpectralSample& s : spectrum.samples)
            each.push_back(f.quantity(s.wavelength));
        return each.join(QStringLiteral(" + "));
    }
    // A band: its power-weighted centre first (the figure a data sheet gives), then the span it was sampled over.
    double centre = 0.0;
    double total = 0.0;
    for (const model::SpectralSample& s : spectrum.samples) {
        centre += s.wavelength.si() * s.powerFraction;
        total += s.powerFraction;
    }
    const QString span = Sheet::tr("%1 to %2").arg(f.quantity(spectrum.shortest()), f.quantity(spectrum.longest()));
    if (!(total > 0.0))
        return span;
    return Sheet::tr("%1 (band %2)").arg(f.quantity(units::Wavelength::fromSi(centre / total)), span);
}

QString timingText(const model::Emission& e, const SheetFormat& f)
{
    if (!e.pulsed)
        return Sheet::tr("CW, %1").arg(f.quantity(e.averagePower));
    QString text =
        Sheet::tr("%1 pulses at %2, %3 per pulse (%4 mean)")
            .arg(f.quantity(e.pulseDuration), f.quantity(e.prf), f.quantity(e.pulseEnergy), f.quantity(e.averagePower));
    if (e.burst)
        text +=
            QStringLiteral(", ") + Sheet::tr("in bursts of %1 at %2")
                                       .arg(QString::number(e.burst->pulsesPerBurst), f.quantity(e.burst->burstRate));
    return text;
}

QString beamText(const model::Beam& b, const SheetFormat& f)
{
    const QString definition =
        // A word joiner keeps "1/e²" on one line (a slash is otherwise a place to break).
        b.definition == model::BeamDefinition::OneOverE ? QStringLiteral("1/\u2060e")
                                                        : QStringLiteral("1/\u2060e\u00b2");
    QString text = Sheet::tr("beam %1 (%2), divergence %3")
                       .arg(f.beamDiameter(b.diameter), definition, f.divergence(b.divergence));
    if (b.profile == model::BeamProfile::Gaussian)
        text += QStringLiteral(", ") + Sheet::tr("Gaussian");
    else if (b.profile == model::BeamProfile::FlatTop)
        text += QStringLiteral(", ") + Sheet::tr("flat-top");
    return text;
}

CaseRow caseRow(const assessment::CaseAssessment& ca, const SheetFormat& f)
{
    const hazard::HazardResult& eye = ca.eye;
    const model::ExposureCase& how = eye.request.exposureCase;
    CaseRow row;
    row.name = fromUtf8(ca.name);
    const QString where = eye.pointDistance.si() <= 0.0 ? Sheet::tr("at the exit")
                                                        : Sheet::tr("at %1").arg(f.quantity(eye.pointDistance, 3));
    row.detail =
        joined({f.viewing(how.viewing), where, Sheet::tr("%1 exposure").arg(f.quantity(eye.basis.duration, 3))}, kDot);

    const QString perPulse = Sheet::tr("%1 per pulse");
    row.mpe.text = eye.pulsed ? perPulse.arg(f.quantity(units::RadiantExposure::fromSi(eye.limit), 3))
                              : f.quantity(units::Irradiance::fromSi(eye.limit), 3);
    if (!eye.lines.empty()) {
        const limits::MpeResult& mpe = eye.lines[std::min(eye.governingLine, eye.lines.size() - 1)].mpe;
        row.mpe.reconstructed = restsOnReconstructed(mpe);
        QString set;
        if (mpe.setCount > 0)
            set = mpe.setsTie ? Sheet::tr("both editions") : SheetFormat::shortRuleSetName(mpe.governing().set);
        const limits::LimitRow* limitRow = governingRow(mpe);
        row.mpeRule = joined({set, eye.pulsed ? SheetFormat::pulseRule(eye.governingRule) : QString(),
                              limitRow ? formulaText(limitRow->formula) : QString()},
                             kDot);
    }
    const bool anyReconstructed = anyLineReconstructed(eye);
    row.eyeVerdict = {f.exposureVerdict(eye.combinedRatio), anyReconstructed};
    row.eyeOver = eye.combinedRatio > 1.0;
    row.skinVerdict = {f.exposureVerdict(ca.skin.ratio), ca.skin.limit > 0.0 && restsOnReconstructed(ca.skin.mpe)};
    row.skinOver = ca.skin.ratio > 1.0;
    row.nohd = {f.distance(eye.nohd), anyReconstructed};
    if (how.viewing == model::Viewing::Diffuse)
        row.nohdDetail = Sheet::tr("hazard radius");
    else if (eye.nohd.kind == hazard::DistanceKind::Unbounded)
        row.nohdDetail = Sheet::tr("does not end within the model");
    row.od = {f.requiredOd(eye.requiredOd), anyReconstructed};
    return row;
}

void addNotes(SheetModel& m, const SheetContent& content)
{
    // The same caution for several outputs is printed once, naming them all.
    std::vector<std::pair<std::string, std::vector<std::string>>> grouped;
    auto add = [&](const std::string& text, const std::string& output) {
        auto it = std::find_if(grouped.begin(), grouped.end(), [&](const auto& g) { return g.first == text; });
        if (it == grouped.end()) {
            grouped.push_back({text, {}});
            it = grouped.end() - 1;
        }
        if (!output.empty() && std::find(it->second.begin(), it->second.end(), output) == it->second.end())
            it->second.push_back(output);
    };
    for (const assessment::OutputAssessment& o : content.assessment.outputs) {
        for (const assessment::CaseAssessment& c : o.cases) {
            for (const std::string& note : c.eye.notes) {
                if (note.find("reconstructed") == std::string::npos)
                    add(note, o.name);
            }
        }
    }
    // The selection's own note says what the purchase list above already shows.
    if (m.purchaseMarkings.isEmpty()) {
        for (const std::string& note : content.assessment.selection.notes)
            add(note, {});
    }
    for (const auto& [text, outputs] : grouped) {
        QStringList names;
        for (const std::string& n : outputs)
            names.push_back(fromUtf8(n));
        m.notes.push_back(names.isEmpty() ? fromUtf8(text)
                                          : names.join(QStringLiteral(", ")) + QStringLiteral(": ") + fromUtf8(text));
    }
}

void addRecord(SheetModel& m, const SheetContent& content)
{
    if (content.records.empty()) {
        m.recordSummary = Sheet::tr("No assessment of this laser is on record: the figures on this sheet are computed "
                                    "from the current inputs and have not been reviewed.");
        return;
    }
    const model::Assessment& latest = content.records.back();
    const QString title = latest.title.empty() ? Sheet::tr("Assessment %1").arg(latest.id) : fromUtf8(latest.title);
    m.recordSummary = Sheet::tr("%1: %2").arg(title, SheetFormat::status(latest.status));
    QStringList who;
    if (!latest.author.empty())
        who.push_back(Sheet::tr("by %1").arg(fromUtf8(latest.author)));
    if (!latest.created.empty())
        who.push_back(Sheet::tr("created %1").arg(SheetFormat::timeStamp(latest.created)));
    if (!latest.updated.empty() && latest.updated != latest.created)
        who.push_back(Sheet::tr("last changed %1").arg(SheetFormat::timeStamp(latest.updated)));
    if (!latest.programVersion.empty())
        who.push_back(Sheet::tr("computed by Beamwarden %1").arg(fromUtf8(latest.programVersion)));
    if (!who.isEmpty())
        m.recordLines.push_back(who.join(QStringLiteral(", ")));
    if (latest.outOfDate)
        m.recordWarning = Sheet::tr("Out of date: the laser changed after this assessment, so its figures no longer "
                                    "describe it. The figures on this sheet are computed from the current inputs.");
    else if (latest.status == model::AssessmentStatus::Withdrawn)
        m.recordWarning = Sheet::tr("Withdrawn: this assessment no longer stands. The figures on this sheet are "
                                    "computed from the current inputs.");
    else if (latest.status != model::AssessmentStatus::Approved)
        m.recordWarning = Sheet::tr("Not approved yet: the figures on this sheet are computed from the current "
                                    "inputs.");
    if (content.records.size() > 1)
        m.recordLines.push_back(
            Sheet::tr("Earlier assessments on record: %1.").arg(static_cast<qlonglong>(content.records.size() - 1)));
    for (const model::SignOff& s : latest.signOffs)
        m.signOffs.push_back(SignOffRow{
            SheetFormat::timeStamp(s.when), fromUtf8(s.who),
            Sheet::tr("%1 to %2").arg(SheetFormat::status(s.from), SheetFormat::status(s.to)), fromUtf8(s.comment)});
}

} // namespace

bool anyLineReconstructed(const hazard::HazardResult& eye, double from_nm, double to_nm)
{
    return std::any_of(eye.lines.begin(), eye.lines.end(), [&](const hazard::LineResult& line) {
        const double lambda = line.sample.wavelength.nanometres();
        return lambda >= from_nm - 1e-6 && lambda <= to_nm + 1e-6 && restsOnReconstructed(line.mpe);
    });
}

SheetModel buildSheetModel(const SheetContent& content)
{
    const SheetFormat f(content.language);
    const assessment::LaserAssessment& a = content.assessment;
    const model::Laser& laser = a.laser;
    const QString today = QDate::currentDate().toString(Qt::ISODate);

    SheetModel m;
    m.laserName = fromUtf8(laser.name);
    m.documentTitle = Sheet::tr("%1 hazard sheet").arg(m.laserName);
    m.labName = fromUtf8(content.lab.name);
    QString room = Sheet::tr("Room not recorded");
    if (!laser.room.empty()) {
        room = Sheet::tr("Room %1").arg(fromUtf8(laser.room));
        for (const model::Room& r : content.lab.rooms) {
            if (r.name == laser.room && !r.description.empty())
                room += QStringLiteral(" (") + fromUtf8(r.description) + QLatin1Char(')');
        }
    }
    m.roomLine = room;
    m.lsoName = fromUtf8(content.lab.lsoName);
    m.lsoLine = Sheet::tr("Laser safety officer: %1").arg(m.lsoName.isEmpty() ? Sheet::tr("not recorded") : m.lsoName);
    m.laserClass = SheetFormat::laserClass(laser.laserClass);
    m.laserLine = joined({m.laserClass, fromUtf8(laser.makerModel),
                          laser.serial.empty() ? QString() : Sheet::tr("serial %1").arg(fromUtf8(laser.serial))},
                         kDot);

    QString rules = content.ruleSetNames.size() > 1
                        ? Sheet::tr("Limits: the stricter of %1 and %2, figure by figure")
                              .arg(content.ruleSetNames.value(0), content.ruleSetNames.value(1))
                        : Sheet::tr("Limits: %1").arg(content.ruleSetNames.value(0));
    if (a.options.rules != limits::RuleChoice::Iec60825_1_2007)
        rules += QStringLiteral("; ") + (a.options.c5 == limits::C5Option::Conservative
                                             ? Sheet::tr("2014 repeated-pulse factor C5: conservative reading")
                                             : Sheet::tr("2014 repeated-pulse factor C5: edition reading"));
    m.basisLine =
        rules + QStringLiteral(". ") + Sheet::tr("Computed by Beamwarden %1 on %2.").arg(content.programVersion, today);
    m.caution = content.caution;
    m.shortCaution = Sheet::tr("Caution: the full caution is on page 1. These figures support, and never replace, the "
                               "judgement of your laser safety officer.");
    m.footerLeft = Sheet::tr("Beamwarden %1, %2").arg(content.programVersion, today);

    for (std::size_t i = 0; i < a.outputs.size(); ++i) {
        OutputRows rows;
        rows.name = fromUtf8(a.outputs[i].name);
        if (i < laser.outputs.size()) {
            const model::Output& o = laser.outputs[i];
            rows.light = lightText(o.emission.spectrum, f);
            rows.timing = timingText(o.emission, f);
            rows.beam = beamText(o.beam, f);
        }
        for (const assessment::CaseAssessment& c : a.outputs[i].cases) {
            rows.cases.push_back(caseRow(c, f));
            const CaseRow& r = rows.cases.back();
            m.anyReconstructed = m.anyReconstructed || r.mpe.reconstructed || r.eyeVerdict.reconstructed ||
                                 r.skinVerdict.reconstructed || r.nohd.reconstructed || r.od.reconstructed;
        }
        m.outputs.push_back(std::move(rows));
    }
    addEyewearModel(m, content, f);
    addNotes(m, content);
    addRecord(m, content);
    return m;
}

} // namespace beamwarden::sheet
