-- Idempotency keys belong to their sender: a client's key to its account and operation, the service's own keys to
-- an internal space no client can write. Existing keys are assigned as they were used.
alter table stock_movement add column idempotency_owner varchar(160);

update stock_movement set idempotency_owner = 'internal/repair', idempotency_key = substring(idempotency_key, 8)
where idempotency_key like 'repair:%' and repair_id is not null;

update stock_movement set idempotency_owner = 'internal/request', idempotency_key = substring(idempotency_key, 9)
where idempotency_key like 'request:%' and kind = 'ISSUE_TO_KIT' and exists (
    select 1 from parts_request_line l
    where 'request:' || cast(l.parts_request_id as varchar(20)) || ':' || cast(l.id as varchar(20)) = stock_movement.idempotency_key);

update stock_movement set idempotency_owner = 'account:' || actor || '/receipt'
where idempotency_key is not null and idempotency_owner is null and purchase_order_line_id is not null;

update stock_movement set idempotency_owner = 'account:' || actor || '/movement'
where idempotency_key is not null and idempotency_owner is null;

alter table stock_movement drop constraint uq_stock_movement_idempotency;
alter table stock_movement add constraint uq_stock_movement_idempotency unique (idempotency_owner, idempotency_key);
