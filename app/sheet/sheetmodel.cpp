#include "sheetmodel.hpp"

#include "beamwarden/limits/ruleset.hpp"
#include "sheetformat.hpp"
#include "sheettr.hpp"

#include <QDate>
#include <QRegularExpression>

#include <algorithm>
#include <cmath>
#include <limits>
#include <map>
#include <optional>
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

bool anyLineReconstructed(const hazard::HazardResult& eye, double from_nm = 0.0,
                          double to_nm = std::numeric_limits<double>::infinity())
{
    return std::any_of(eye.lines.begin(), eye.lines.end(), [&](const hazard::LineResult& line) {
        const double lambda = line.sample.wavelength.nanometres();
        return lambda >= from_nm - 1e-6 && lambda <= to_nm + 1e-6 && restsOnReconstructed(line.mpe);
    });
}

// The row's formula as printed for a person, with the area units written as on paper.
QString formulaText(std::string_view formula)
{
    QString text = fromUtf8(formula);
    text.replace(QStringLiteral("m^2"), QStringLiteral("m\u00b2"));
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
    QString text = Sheet::tr("%1 pulses at %2, %3 per pulse (%4 mean)")
                       .arg(f.quantity(e.pulseDuration), f.quantity(e.prf), f.quantity(e.pulseEnergy),
                            f.quantity(e.averagePower));
    if (e.burst)
        text += QStringLiteral(", ") + Sheet::tr("in bursts of %1 at %2")
                                           .arg(QString::number(e.burst->pulsesPerBurst), f.quantity(e.burst->burstRate));
    return text;
}

QString beamText(const model::Beam& b, const SheetFormat& f)
{
    const QString definition =
        // A word joiner keeps "1/e²" on one line (a slash is otherwise a place to break).
        b.definition == model::BeamDefinition::OneOverE ? QStringLiteral("1/\u2060e") : QStringLiteral("1/\u2060e\u00b2");
    QString text = Sheet::tr("beam %1 (%2), divergence %3")
                       .arg(f.quantity(b.diameter), definition, f.divergence(b.divergence));
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
    row.detail = joined({f.viewing(how.viewing), where, Sheet::tr("%1 exposure").arg(f.quantity(eye.basis.duration, 3))},
                        kDot);

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

// The eyewear the plot and the band table show: the first item (or pair) that covers every output, else the item
// with the largest OD margin.
struct Chosen {
    std::vector<std::size_t> items;
    std::vector<std::vector<std::string>> outputsCovered;
    bool covers = false;
};

Chosen chooseEyewear(const SheetContent& content)
{
    const assessment::LaserAssessment& a = content.assessment;
    Chosen chosen;
    const eyewear::Selection& s = a.selection;
    const eyewear::Choice* choice = !s.singles.empty() ? &s.singles.front() : !s.pairs.empty() ? &s.pairs.front()
                                                                                                : nullptr;
    if (choice) {
        chosen.items = choice->items;
        chosen.outputsCovered = choice->outputsCovered;
        chosen.covers = true;
        return chosen;
    }
    // Nothing covers: show the item with OD data that covers the most outputs (then the fewest shortfalls).
    std::optional<std::size_t> best;
    std::tuple<int, int, double> bestScore{};
    for (std::size_t i = 0; i < a.eyewear.size() && i < content.shelf.size(); ++i) {
        const model::EyewearItem& item = content.shelf[i];
        if (item.spectralOd.empty() && item.en207Markings.empty() && item.en208Markings.empty())
            continue;
        const eyewear::ProtectionCheck& c = a.eyewear[i].check;
        int covered = 0;
        int notShort = 0;
        for (const eyewear::OutputCheck& o : c.outputs) {
            covered += o.verdict == eyewear::Verdict::Covers ? 1 : 0;
            notShort += o.verdict != eyewear::Verdict::FallsShort ? 1 : 0;
        }
        const std::tuple<int, int, double> score{covered, notShort,
                                                 std::isfinite(c.marginOd) ? c.marginOd : -1e300};
        if (!best || score > bestScore) {
            best = i;
            bestScore = score;
        }
    }
    if (best)
        chosen.items = {*best};
    return chosen;
}

std::optional<eyewear::ParsedEyewear> parsedItem(const SheetContent& content, std::size_t index)
{
    if (index >= content.shelf.size())
        return std::nullopt;
    auto parsed = eyewear::parseEyewear(content.shelf[index]);
    if (!parsed)
        return std::nullopt;
    return std::move(*parsed);
}

// The lowest OD the item promises over [from, to] nm; nullopt where some wavelength is not rated.
std::optional<double> lowestProvided(const eyewear::ParsedEyewear& item, double from_nm, double to_nm)
{
    double lowest = std::numeric_limits<double>::infinity();
    const int steps = from_nm == to_nm ? 0 : 24;
    for (int i = 0; i <= steps; ++i) {
        const double lambda = steps == 0 ? from_nm : from_nm + (to_nm - from_nm) * i / steps;
        const eyewear::ProvidedOd p = eyewear::providedOd(item, lambda);
        if (!p.rated)
            return std::nullopt;
        lowest = std::min(lowest, p.od);
    }
    return lowest;
}

PlotCurve curveFor(const eyewear::ParsedEyewear& item, double from_nm, double to_nm)
{
    std::vector<double> lambdas;
    constexpr int kSamples = 480;
    for (int i = 0; i <= kSamples; ++i)
        lambdas.push_back(from_nm * std::pow(to_nm / from_nm, static_cast<double>(i) / kSamples));
    // The edges of every rated span, so steps sit where the item's data puts them.
    auto edge = [&](double nm) {
        for (const double x : {nm * (1.0 - 1e-9), nm, nm * (1.0 + 1e-9)}) {
            if (x > from_nm && x < to_nm)
                lambdas.push_back(x);
        }
    };
    for (const model::OdRow& row : item.item.spectralOd) {
        edge(row.from.nanometres());
        edge(row.to.nanometres());
    }
    for (const eyewear::En207Marking& marking : item.en207) {
        for (const eyewear::MarkingTerm& term : marking.terms) {
            for (const eyewear::WavelengthSpan& span : term.wavelengths) {
                edge(span.from_nm);
                edge(span.to_nm);
            }
        }
    }
    std::sort(lambdas.begin(), lambdas.end());
    PlotCurve curve;
    curve.label = fromUtf8(item.item.name);
    for (const double lambda : lambdas) {
        const eyewear::ProvidedOd p = eyewear::providedOd(item, lambda);
        curve.points.emplace_back(lambda, p.rated ? p.od : std::numeric_limits<double>::quiet_NaN());
    }
    return curve;
}

QString firstReason(const eyewear::ProtectionCheck& check, const SheetFormat& f)
{
    for (const eyewear::OutputCheck& o : check.outputs) {
        if (o.verdict == check.verdict && !o.reasons.empty())
            return fromUtf8(o.reasons.front());
    }
    if (check.verdict == eyewear::Verdict::Covers && std::isfinite(check.marginOd))
        return Sheet::tr("OD margin %1").arg(QStringLiteral("+") + f.number(check.marginOd, 1));
    return {};
}

void addBandsAndShelf(SheetModel& m, const SheetContent& content, const SheetFormat& f)
{
    const assessment::LaserAssessment& a = content.assessment;
    const Chosen chosen = chooseEyewear(content);

    std::vector<std::optional<eyewear::ParsedEyewear>> chosenItems;
    QStringList chosenNames;
    for (const std::size_t i : chosen.items) {
        chosenItems.push_back(parsedItem(content, i));
        if (i < a.eyewear.size())
            chosenNames.push_back(fromUtf8(a.eyewear[i].itemName));
    }

    // Bands merged over outputs and cases: the highest requirement of each, with the outputs it comes from.
    struct Merged {
        double from_nm = 0;
        double to_nm = 0;
        double od = 0;
        bool reconstructed = false;
        std::vector<std::string> outputs;
    };
    std::map<std::pair<long long, long long>, Merged> merged;
    for (const assessment::OutputAssessment& o : a.outputs) {
        for (const assessment::CaseAssessment& c : o.cases) {
            for (const hazard::BandOd& band : c.eye.bands) {
                const double from = band.from.nanometres();
                const double to = band.to.nanometres();
                const auto key = std::make_pair(std::llround(from * 100.0), std::llround(to * 100.0));
                Merged& entry = merged[key];
                entry.from_nm = from;
                entry.to_nm = to;
                entry.od = std::max(entry.od, hazard::roundOdUp(band.requiredOd));
                entry.reconstructed = entry.reconstructed || anyLineReconstructed(c.eye, from, to);
                if (std::find(entry.outputs.begin(), entry.outputs.end(), o.name) == entry.outputs.end())
                    entry.outputs.push_back(o.name);
            }
        }
    }

    m.providedHeader = chosenNames.isEmpty() ? Sheet::tr("Eyewear OD") : Sheet::tr("OD of %1").arg(chosenNames.join(
                                                                                 QStringLiteral(" / ")));
    for (const auto& [key, entry] : merged) {
        BandRow row;
        row.from_nm = entry.from_nm;
        row.to_nm = entry.to_nm;
        row.requiredOd = entry.od;
        row.band = entry.from_nm == entry.to_nm
                       ? f.quantity(units::Wavelength::fromSi(entry.from_nm * 1e-9))
                       : Sheet::tr("%1 to %2")
                             .arg(f.quantity(units::Wavelength::fromSi(entry.from_nm * 1e-9)),
                                  f.quantity(units::Wavelength::fromSi(entry.to_nm * 1e-9)));
        QStringList outputs;
        for (const std::string& name : entry.outputs)
            outputs.push_back(fromUtf8(name));
        row.outputs = outputs.join(QStringLiteral(", "));
        row.required = {entry.od > 0.0 ? f.number(entry.od, 1) : Sheet::tr("none"), entry.reconstructed};

        // With a pair, the band is judged against the item worn for its output.
        std::size_t which = 0;
        for (std::size_t k = 0; k < chosen.outputsCovered.size() && k < chosenItems.size(); ++k) {
            const auto& covered = chosen.outputsCovered[k];
            if (std::any_of(entry.outputs.begin(), entry.outputs.end(), [&](const std::string& name) {
                    return std::find(covered.begin(), covered.end(), name) != covered.end();
                })) {
                which = k;
                break;
            }
        }
        if (which < chosenItems.size() && chosenItems[which]) {
            const std::optional<double> provided = lowestProvided(*chosenItems[which], entry.from_nm, entry.to_nm);
            if (!provided) {
                row.provided = Sheet::tr("not rated here");
                row.providedShort = true;
            } else if (*provided + 1e-9 >= entry.od) {
                row.provided = Sheet::tr("%1, enough").arg(f.number(*provided, 1));
            } else {
                row.provided = Sheet::tr("%1, short by %2").arg(f.number(*provided, 1), f.number(entry.od - *provided, 1));
                row.providedShort = true;
            }
            if (chosenItems.size() > 1 && which < static_cast<std::size_t>(chosenNames.size()))
                row.provided = chosenNames[static_cast<qsizetype>(which)] + QStringLiteral(": ") + row.provided;
        } else {
            row.provided = QStringLiteral("\u2014");
        }
        m.bands.push_back(row);
        m.plot.required.push_back(PlotBand{entry.from_nm, entry.to_nm, entry.od});
    }

    // Plot range: every band with some room either side, within the range any rule covers.
    double lo = std::numeric_limits<double>::infinity();
    double hi = 0.0;
    for (const BandRow& b : m.bands) {
        lo = std::min(lo, b.from_nm);
        hi = std::max(hi, b.to_nm);
    }
    if (!(hi > 0.0)) {
        lo = 400.0;
        hi = 700.0;
    }
    m.plot.from_nm = std::max(180.0, lo / 1.6);
    m.plot.to_nm = std::min(1e6, hi * 1.6);
    for (const auto& item : chosenItems) {
        if (item)
            m.plot.eyewear.push_back(curveFor(*item, m.plot.from_nm, m.plot.to_nm));
    }
    if (!chosen.covers && !chosen.items.empty())
        m.plot.eyewearNote = Sheet::tr("best on the shelf; it does not cover every output");

    // The verdict in a sentence, then every shelf item with its verdict and first reason.
    const eyewear::Selection& s = a.selection;
    auto itemName = [&](std::size_t i) { return i < a.eyewear.size() ? fromUtf8(a.eyewear[i].itemName) : QString(); };
    auto outputsText = [](const std::vector<std::string>& names) {
        QStringList list;
        for (const std::string& n : names)
            list.push_back(fromUtf8(n));
        return list.join(QStringLiteral(", "));
    };
    if (a.eyewear.empty()) {
        m.eyewearSummary = Sheet::tr("No eyewear on the shelf: nothing has been checked against this laser.");
    } else if (!s.singles.empty()) {
        m.eyewearSummary = Sheet::tr("Wear %1: it covers every output.").arg(itemName(s.singles.front().items.front()));
        QStringList others;
        for (std::size_t i = 1; i < s.singles.size(); ++i)
            others.push_back(itemName(s.singles[i].items.front()));
        if (!others.isEmpty())
            m.eyewearSummary += QLatin1Char(' ') + Sheet::tr("Also covering: %1.").arg(others.join(QStringLiteral(", ")));
    } else if (!s.pairs.empty() && s.pairs.front().items.size() == 2) {
        const eyewear::Choice& pair = s.pairs.front();
        m.eyewearSummary = Sheet::tr("No single item covers every output. Wear %1 for %2, and %3 for %4.")
                               .arg(itemName(pair.items[0]), outputsText(pair.outputsCovered[0]),
                                    itemName(pair.items[1]), outputsText(pair.outputsCovered[1]));
    } else {
        m.eyewearSummary = Sheet::tr("Nothing on the shelf covers every output.");
    }
    if (s.singles.empty() && s.pairs.empty()) {
        // The OD each line ends with is the band table's "Required OD"; printed once, there.
        static const QRegularExpression odSuffix(QStringLiteral(", OD >= [0-9.]+$"));
        for (const std::string& marking : s.purchaseMarkings)
            m.purchaseMarkings.push_back(fromUtf8(marking).remove(odSuffix));
    }
    // Items that fall short (or cannot be told) for the same first reason share a row, so a long shelf of goggles
    // for other wavelengths reads as one line.
    for (std::size_t i = 0; i < a.eyewear.size(); ++i) {
        ShelfRow row;
        row.name = itemName(i);
        row.verdict = a.eyewear[i].check.verdict;
        row.verdictText = SheetFormat::verdict(row.verdict);
        row.reason = firstReason(a.eyewear[i].check, f);
        row.chosen = std::find(chosen.items.begin(), chosen.items.end(), i) != chosen.items.end();
        const auto same = std::find_if(m.shelf.begin(), m.shelf.end(), [&](const ShelfRow& r) {
            return !r.chosen && !row.chosen && r.verdict != eyewear::Verdict::Covers && r.verdict == row.verdict &&
                   r.reason == row.reason;
        });
        if (same != m.shelf.end())
            same->name += QStringLiteral(", ") + row.name;
        else
            m.shelf.push_back(row);
    }
    // What is worn first, then what covers, then the rest from "cannot tell" to "falls short".
    std::stable_sort(m.shelf.begin(), m.shelf.end(), [](const ShelfRow& x, const ShelfRow& y) {
        return std::make_pair(!x.chosen, x.verdict) < std::make_pair(!y.chosen, y.verdict);
    });
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
        m.recordLines.push_back(Sheet::tr("Out of date: the laser changed after this assessment, so its figures no "
                                          "longer describe it. The figures on this sheet are computed from the "
                                          "current inputs."));
    else if (latest.status != model::AssessmentStatus::Approved)
        m.recordLines.push_back(Sheet::tr("Not approved yet: the figures on this sheet are computed from the current "
                                          "inputs."));
    if (content.records.size() > 1)
        m.recordLines.push_back(
            Sheet::tr("Earlier assessments on record: %1.").arg(static_cast<qlonglong>(content.records.size() - 1)));
    for (const model::SignOff& s : latest.signOffs)
        m.signOffs.push_back(SignOffRow{SheetFormat::timeStamp(s.when), fromUtf8(s.who),
                                        Sheet::tr("%1 to %2").arg(SheetFormat::status(s.from),
                                                                  SheetFormat::status(s.to)),
                                        fromUtf8(s.comment)});
}

} // namespace

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
    m.lsoLine = Sheet::tr("Laser safety officer: %1")
                    .arg(m.lsoName.isEmpty() ? Sheet::tr("not recorded") : m.lsoName);
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
    m.basisLine = rules + QStringLiteral(". ") +
                  Sheet::tr("Computed by Beamwarden %1 on %2.").arg(content.programVersion, today);
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
    addBandsAndShelf(m, content, f);
    addNotes(m, content);
    addRecord(m, content);
    return m;
}

} // namespace beamwarden::sheet
