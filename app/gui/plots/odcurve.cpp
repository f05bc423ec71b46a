// The OD chart: the output's required OD per band and every eyewear item's promised OD against wavelength.
#include "plots/curvesampling.hpp"
#include "plots/limitcurvecontent.hpp"
#include "widgets/palette.hpp"

#include "beamwarden/eyewear/protection.hpp"

#include <algorithm>
#include <array>
#include <cmath>

namespace beamwarden::gui {

using curves::kNaN;
using curves::text;

namespace {

constexpr double kNarrowBand_nm = 4; // a single line drawn this wide so it can be seen
constexpr int kOdSamples = 700;
// More curves than this make an unreadable legend, and a site's shelf can hold thousands of items: the chart shows
// the items that protect best against this case.
constexpr std::size_t kMaxShelfCurves = 8;

// The shelf items to draw, in shelf order: all of a small shelf; of a large one, those covering this output and
// case first, then those that cannot tell, then the others. `outcomes` are in shelf order (assessment.hpp).
std::vector<std::size_t> itemsToDraw(const std::vector<model::EyewearItem>& shelf,
                                     const std::vector<assessment::EyewearOutcome>& outcomes,
                                     const std::string& outputName, const std::string& caseName)
{
    std::vector<std::size_t> chosen(shelf.size());
    for (std::size_t i = 0; i < shelf.size(); ++i)
        chosen[i] = i;
    if (shelf.size() <= kMaxShelfCurves)
        return chosen;
    const auto rank = [&](std::size_t i) {
        if (i >= outcomes.size() || outcomes[i].itemName != shelf[i].name)
            return 3;
        for (const eyewear::OutputCheck& check : outcomes[i].check.outputs) {
            if (check.outputName == outputName && check.caseName == caseName)
                return check.verdict == eyewear::Verdict::Covers       ? 0
                       : check.verdict == eyewear::Verdict::CannotTell ? 1
                                                                       : 2;
        }
        return 3;
    };
    std::vector<std::pair<int, std::size_t>> ranked;
    ranked.reserve(shelf.size());
    for (std::size_t i = 0; i < shelf.size(); ++i)
        ranked.emplace_back(rank(i), i);
    std::partial_sort(ranked.begin(), ranked.begin() + static_cast<std::ptrdiff_t>(kMaxShelfCurves), ranked.end());
    chosen.clear();
    for (std::size_t k = 0; k < kMaxShelfCurves; ++k)
        chosen.push_back(ranked[k].second);
    std::sort(chosen.begin(), chosen.end());
    return chosen;
}

} // namespace

ChartContent LimitCurveContent::odAgainstWavelength(const assessment::CaseAssessment& exposureCase,
                                                    const std::string& outputName,
                                                    const std::vector<model::EyewearItem>& shelf,
                                                    const std::vector<assessment::EyewearOutcome>& outcomes)
{
    const hazard::HazardResult& eye = exposureCase.eye;
    ChartContent content;
    content.title = tr("Required and available optical density against wavelength");

    // The bands as drawn: a line, or a band narrower than a few nm, widened about its centre.
    struct Band {
        double from = 0;
        double to = 0;
        double od = 0;
    };
    std::vector<Band> bands;
    for (const hazard::BandOd& band : eye.bands) {
        double from = band.from.nanometres();
        double to = band.to.nanometres();
        if (to - from < kNarrowBand_nm) {
            const double centre = 0.5 * (from + to);
            from = centre - kNarrowBand_nm / 2;
            to = centre + kNarrowBand_nm / 2;
        }
        bands.push_back(Band{from, to, band.requiredOd});
    }
    std::sort(bands.begin(), bands.end(), [](const Band& a, const Band& b) { return a.from < b.from; });
    double lo = bands.empty() ? 400 : bands.front().from;
    double hi = lo;
    double top = 0;
    for (const Band& band : bands) {
        hi = std::max(hi, band.to);
        top = std::max(top, band.od);
    }
    const double pad = std::max(100.0, 0.5 * (hi - lo));
    const double xmin = std::max(180.0, std::floor((lo - pad) / 10) * 10);
    const double xmax = std::ceil((hi + pad) / 10) * 10;

    ChartCurve required{tr("Required OD"), palette::kVermillion, 2.0, LineStyle::Solid, true, {}};
    std::size_t labelled = 0;
    for (const Band& band : bands) {
        required.points.emplace_back(band.from, 0);
        required.points.emplace_back(band.from, band.od);
        required.points.emplace_back(band.to, band.od);
        required.points.emplace_back(band.to, 0);
        if (labelled++ < 6) {
            const QString words =
                band.od > 0 ? tr("OD %1 required").arg(hazard::roundOdUp(band.od), 0, 'f', 1) : tr("no OD required");
            content.labels.push_back(
                ChartLabel{words, palette::kVermillion, QPointF(band.to, band.od), LabelPlacement::Above});
        }
    }
    content.curves.push_back(std::move(required));

    // Each item's promised OD over the plotted range, stepped as its rows and markings step; where nothing rates
    // the wavelength the curve is broken (absent), never drawn as zero.
    const std::array<QColor, 5> colours = {palette::kBlue, palette::kBluishGreen, palette::kReddishPurple,
                                           palette::kSkyBlue, palette::kOrange};
    const std::array<LineStyle, 4> styles = {LineStyle::Solid, LineStyle::Dashed, LineStyle::DashDot,
                                             LineStyle::Dotted};
    QStringList absent;
    QStringList unreadable;
    const std::vector<std::size_t> drawn = itemsToDraw(shelf, outcomes, outputName, exposureCase.name);
    for (const std::size_t i : drawn) {
        const model::EyewearItem& item = shelf[i];
        const auto parsed = eyewear::parseEyewear(item);
        if (!parsed) {
            unreadable.append(text(item.name));
            continue;
        }
        ChartCurve curve{text(item.name), colours.at(i % colours.size()), 2.2, styles.at(i % styles.size()), false, {}};
        double previous = kNaN;
        int rated = 0;
        double itemTop = 0;
        for (int s = 0; s < kOdSamples; ++s) {
            const double lambda = xmin + (xmax - xmin) * s / (kOdSamples - 1);
            const eyewear::ProvidedOd provided = eyewear::providedOd(*parsed, lambda);
            const double od = provided.rated ? provided.od : kNaN;
            const bool same = (std::isnan(od) && std::isnan(previous)) || od == previous;
            if (s > 0 && !same) {
                const double edge = lambda - 0.5 * (xmax - xmin) / (kOdSamples - 1);
                if (!std::isnan(previous))
                    curve.points.emplace_back(edge, previous);
                if (std::isnan(od))
                    curve.points.emplace_back(edge, kNaN); // the break
                else
                    curve.points.emplace_back(edge, od);
            } else if (s == 0 && !std::isnan(od)) {
                curve.points.emplace_back(lambda, od);
            }
            if (s == kOdSamples - 1 && !std::isnan(od))
                curve.points.emplace_back(lambda, od);
            if (!std::isnan(od)) {
                ++rated;
                itemTop = std::max(itemTop, od);
            }
            previous = od;
        }
        if (rated < 2) { // a rating that only touches the edge of the range is not worth a line
            absent.append(text(item.name));
            continue;
        }
        top = std::max(top, itemTop);
        // The outcome of item i is at i (shelf order); searched by name only if the two lists disagree.
        const auto outcome =
            i < outcomes.size() && outcomes[i].itemName == item.name
                ? outcomes.begin() + static_cast<std::ptrdiff_t>(i)
                : std::find_if(outcomes.begin(), outcomes.end(),
                               [&](const assessment::EyewearOutcome& o) { return o.itemName == item.name; });
        if (outcome != outcomes.end()) {
            for (const eyewear::OutputCheck& check : outcome->check.outputs) {
                if (check.outputName == outputName && check.caseName == exposureCase.name) {
                    const std::string_view verdict = eyewear::toString(check.verdict);
                    curve.name = tr("%1 (%2)").arg(
                        curve.name,
                        QCoreApplication::translate(
                            "Verdict", QByteArray(verdict.data(), static_cast<qsizetype>(verdict.size())).constData()));
                }
            }
        }
        content.curves.push_back(std::move(curve));
    }

    QStringList notes;
    if (shelf.empty())
        notes.append(tr("The eyewear shelf is empty."));
    if (!absent.isEmpty())
        notes.append(tr("No OD data from %1 to %2 nm: %3.").arg(xmin).arg(xmax).arg(absent.join(QStringLiteral(", "))));
    if (!unreadable.isEmpty())
        notes.append(tr("Markings that could not be read: %1.").arg(unreadable.join(QStringLiteral(", "))));
    if (drawn.size() < shelf.size())
        notes.append(
            tr("%1 of the %2 shelf items shown, those that protect best first.").arg(drawn.size()).arg(shelf.size()));
    content.subtitle = notes.join(QChar(u' '));
    content.x = ChartAxis{tr("Wavelength (nm)"), AxisScale::Linear, TickStyle::Plain, xmin, xmax, 0};
    const double ymax = std::ceil(top) + 1;
    content.y = ChartAxis{tr("Optical density"), AxisScale::Linear, TickStyle::Plain, 0, ymax, ymax > 12 ? 2.0 : 1.0};
    return content;
}

} // namespace beamwarden::gui
