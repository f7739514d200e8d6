package org.qfleet.stream;

import java.util.List;
import org.qfleet.drift.Alert;
import org.qfleet.drift.Baseline;
import org.qfleet.drift.LotState;
import org.qfleet.drift.StationState;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.Verdict;

/** Several observers as one: each call goes to every member, in order. */
public final class ObserverGroup implements ServiceObserver {

    private final List<ServiceObserver> members;

    private ObserverGroup(List<ServiceObserver> members) {
        this.members = List.copyOf(members);
    }

    public static ServiceObserver of(ServiceObserver... members) {
        return members.length == 1 ? members[0] : new ObserverGroup(List.of(members));
    }

    @Override
    public void sweepFitted(Sweep sweep, ResonanceResult result, Verdict verdict, long fitNanos) {
        members.forEach(m -> m.sweepFitted(sweep, result, verdict, fitNanos));
    }

    @Override
    public void sweepRejected(String code) {
        members.forEach(m -> m.sweepRejected(code));
    }

    @Override
    public void lotUpdated(LotState lot, Baseline baseline) {
        members.forEach(m -> m.lotUpdated(lot, baseline));
    }

    @Override
    public void lotClosed(String product, String lot) {
        members.forEach(m -> m.lotClosed(product, lot));
    }

    @Override
    public void stationUpdated(StationState station) {
        members.forEach(m -> m.stationUpdated(station));
    }

    @Override
    public void alertPublished(Alert alert) {
        members.forEach(m -> m.alertPublished(alert));
    }
}
